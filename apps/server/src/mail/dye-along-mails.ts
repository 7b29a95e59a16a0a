import type { PrepChecklist, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { escapeHtml } from './auth-mails.ts';
import type { OutgoingMail } from './mailer.ts';

// The announcement and the day-before reminder: plain words, amounts for the recipient's own
// skein and units, the start on their clock, cautions, a calendar file, and a one-click
// unsubscribe (a link in the body and RFC 8058 List-Unsubscribe headers).

export interface DyeAlongMailInput {
  kind: 'announcement' | 'reminder';
  to: string;
  recipientName: string;
  view: PublicDyeAlong;
  pageUrl: string;
  /** The viewer's unsubscribe page (a button, for people). */
  unsubscribePageUrl: string;
  /** POST target for mail programs' one-click unsubscribe. */
  oneClickUrl: string;
  calendar: string;
  messageId: string;
  /** Announced less than a day ahead: no reminder follows, so the checklist comes now. */
  includePrep: boolean;
}

const fmt = (n: number) => String(Number(n.toPrecision(3)));

function dyeLine(d: SupplyList['dyes'][number]): string {
  const measure =
    d.unit === 'mL'
      ? `${fmt(d.amount)} mL${d.household ? ` (${d.household.label})` : ''}`
      : d.unit === 'drop'
        ? `about ${Math.round(d.amount)} drops`
        : `${fmt(d.amount)} g of gel`;
  const what = d.kind === 'stock' ? `${d.name}, ${fmt(d.stockStrengthPct ?? 0)} % stock` : d.name;
  return `${what}: ${measure}, for ${d.colorways.join(', ')}`;
}

function supplySections(s: SupplyList): { title: string; items: string[] }[] {
  const acid = s.acid.map(
    (a) =>
      `${a.acid === 'vinegar' ? `Vinegar (${fmt(a.acidStrengthPct ?? 5)} % acetic acid)` : 'Citric acid crystals'}: ${fmt(a.amountMl)} mL (${a.household.label})`,
  );
  const yarn = s.yarn.map((y) => {
    const fiber = y.fiberContent.map((f) => `${f.pct} % ${f.fiber}`).join(', ');
    return `${y.skeins} × ${fmt(y.skeinWeightG)} g skein of ${y.name}${fiber ? ` (${fiber})` : ''}`;
  });
  return [
    { title: 'Dyes', items: s.dyes.map(dyeLine) },
    { title: 'Acid', items: acid },
    { title: 'Yarn', items: yarn },
    { title: 'Equipment', items: s.equipment.map((e) => `${e.item}: ${e.detail}`) },
  ];
}

function prepSections(p: PrepChecklist) {
  return [
    { title: 'The day before', items: p.dayBefore.map((i) => i.text) },
    { title: 'An hour before', items: p.hourBefore.map((i) => i.text) },
  ];
}

export function dyeAlongMail(input: DyeAlongMailInput): OutgoingMail {
  const { view } = input;
  const skein = view.supplyList.weightOfGoodsG ?? 100;
  const units = view.supplyList.system === 'us' ? 'US measures' : 'metric measures';
  const subject =
    input.kind === 'announcement'
      ? `${view.studio.name} dye-along: ${view.title}, ${view.startsAtLocal.label}`
      : `Tomorrow: ${view.title} with ${view.studio.name}, ${view.startsAtLocal.label}`;
  const intro =
    input.kind === 'announcement'
      ? [
          `Hello ${input.recipientName},`,
          `${view.studio.name} has announced its next dye-along: ${view.title}.`,
        ]
      : [`Hello ${input.recipientName},`, `${view.title} with ${view.studio.name} is tomorrow.`];
  const when = [
    `Starts: ${view.startsAtLocal.label}, for about ${view.expectedLengthMin} minutes.`,
    ...(view.streamUrl ? [`Watch: ${view.streamUrl}`] : []),
  ];
  const sections = [
    ...(input.kind === 'announcement'
      ? [
          {
            title: `What you need for one ${fmt(skein)} g skein of each colorway (${units})`,
            items: [],
          },
          ...supplySections(view.supplyList),
        ]
      : []),
    ...(input.kind === 'reminder' || input.includePrep ? prepSections(view.prepChecklist) : []),
    { title: 'Safety', items: [...view.cautions, view.supplyList.safetyNote] },
  ];
  const closing = [
    `Your amounts, the palette and the full checklist: ${input.pageUrl}`,
    'The calendar file attached adds it to your calendar with an alarm an hour before.',
  ];
  const footer = `You get this because you follow ${view.studio.name} and asked for its e-mails. Stop them with one click: ${input.unsubscribePageUrl}`;

  const text = [
    ...intro,
    '',
    ...when,
    '',
    ...sections.flatMap((s) =>
      s.items.length ? [s.title, ...s.items.map((i) => `- ${i}`), ''] : [`${s.title}:`, ''],
    ),
    ...closing,
    '',
    footer,
  ].join('\n');
  const p = (t: string) => `<p>${escapeHtml(t)}</p>`;
  const html = [
    ...intro.map(p),
    ...when.map(p),
    ...sections.map(
      (s) =>
        `<h3>${escapeHtml(s.title)}</h3>${s.items.length ? `<ul>${s.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>` : ''}`,
    ),
    `<p><a href="${escapeHtml(input.pageUrl)}">Your amounts, the palette and the full checklist</a></p>`,
    p(closing[1]!),
    `<p style="color:#555">You get this because you follow ${escapeHtml(view.studio.name)} and asked for its e-mails. <a href="${escapeHtml(input.unsubscribePageUrl)}">Unsubscribe</a></p>`,
  ].join('\n');

  return {
    to: input.to,
    subject,
    text,
    html,
    messageId: input.messageId,
    headers: {
      // RFC 8058: mail programs POST "List-Unsubscribe=One-Click" to this URL.
      'List-Unsubscribe': `<${input.oneClickUrl}>`,
      'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
    },
    attachments: [
      {
        filename: 'dye-along.ics',
        content: input.calendar,
        contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
      },
    ],
  };
}
