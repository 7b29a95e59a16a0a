import type { OutgoingMail } from './mailer.ts';

// Plain words, one link each; the HTML part mirrors the text part.
function linkMail(
  to: string,
  subject: string,
  lines: string[],
  link: string,
  action: string,
): OutgoingMail {
  const text = [
    ...lines,
    '',
    `${action}: ${link}`,
    '',
    'If this was not you, ignore this e-mail.',
  ].join('\n');
  const html = [
    ...lines.map((l) => `<p>${escapeHtml(l)}</p>`),
    `<p><a href="${escapeHtml(link)}">${escapeHtml(action)}</a></p>`,
    '<p style="color:#555">If this was not you, ignore this e-mail.</p>',
  ].join('\n');
  return { to, subject, text, html };
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export const verificationMail = (to: string, name: string, url: string) =>
  linkMail(
    to,
    'Confirm your e-mail for Vatside',
    [`Hello ${name},`, 'Confirm this address to finish signing up.'],
    url,
    'Confirm my e-mail',
  );

export const passwordResetMail = (to: string, name: string, url: string) =>
  linkMail(
    to,
    'Reset your Vatside password',
    [
      `Hello ${name},`,
      'Someone asked to reset the password for this address. The link works for one hour.',
    ],
    url,
    'Choose a new password',
  );

export const invitationMail = (to: string, studioName: string, inviterName: string, url: string) =>
  linkMail(
    to,
    `${inviterName} invites you to help run ${studioName}`,
    [
      `${inviterName} would like you to be a moderator of ${studioName} on Vatside:`,
      'reviewing shared skeins and answering questions during live dye-alongs.',
      'The link works once and expires in seven days.',
    ],
    url,
    'Accept the invitation',
  );
