import { escapeHtml } from './auth-mails.ts';
import type { OutgoingMail } from './mailer.ts';

// The sharer's e-mails about a review decision: approved (in the gallery), sent back with the
// moderator's words, and featured in the recap. Plain and kind; a one-click unsubscribe in the
// footer and in RFC 8058 List-Unsubscribe headers.

export interface ReviewMailInput {
  kind: 'approved' | 'needsChanges' | 'featured';
  to: string;
  recipientName: string;
  studioName: string;
  dyeAlongTitle: string;
  reason: string | null;
  /** The kind words for how close it came to the inspiration, if the month has a palette. */
  closenessMessage: string | null;
  mySkeinsUrl: string;
  unsubscribePageUrl: string;
  oneClickUrl: string;
  messageId: string;
}

function content(input: ReviewMailInput): { subject: string; body: string[] } {
  const { dyeAlongTitle: title, studioName: studio } = input;
  switch (input.kind) {
    case 'approved':
      return {
        subject: `Your skein is in the ${title} gallery`,
        body: [
          `${studio} approved the skein you shared for ${title}. It now shows in the month's gallery for everyone to enjoy.`,
          ...(input.closenessMessage ? [input.closenessMessage] : []),
        ],
      };
    case 'needsChanges':
      return {
        subject: `A small change for the skein you shared for ${title}`,
        body: [
          `Thank you for sharing your skein. Before it goes in the gallery, a moderator at ${studio} asks:`,
          `“${input.reason ?? 'Please take another look at your photos.'}”`,
          'Edit it from your skeins and it goes back for review.',
        ],
      };
    case 'featured':
      return {
        subject: `Your skein will be featured in the ${title} recap`,
        body: [
          `${studio} picked the skein you shared for ${title} to feature in the recap.`,
          'You agreed to be featured; you can change your mind at any time from your skeins, and it comes out of the recap at once.',
        ],
      };
  }
}

export function reviewMail(input: ReviewMailInput): OutgoingMail {
  const { subject, body } = content(input);
  const greeting = `Hello ${input.recipientName},`;
  const link = `Your skeins: ${input.mySkeinsUrl}`;
  const footer = `You get this because you shared a skein with ${input.studioName}. Stop review e-mails with one click: ${input.unsubscribePageUrl}`;
  const p = (t: string) => `<p>${escapeHtml(t)}</p>`;
  return {
    to: input.to,
    subject,
    text: [greeting, '', ...body, '', link, '', footer].join('\n'),
    html: [
      p(greeting),
      ...body.map(p),
      `<p><a href="${escapeHtml(input.mySkeinsUrl)}">Your skeins</a></p>`,
      `<p style="color:#555">You get this because you shared a skein with ${escapeHtml(input.studioName)}. <a href="${escapeHtml(input.unsubscribePageUrl)}">Stop review e-mails</a></p>`,
    ].join('\n'),
    messageId: input.messageId,
    headers: {
      'List-Unsubscribe': `<${input.oneClickUrl}>`,
      'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
    },
  };
}
