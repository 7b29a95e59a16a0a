import type { DyeAlongStatus } from '@vatside/contracts/dye-alongs';

/** Each status in words with a glyph, so it never rests on color alone. */
export const statusNames: Record<DyeAlongStatus, { label: string; glyph: string; hint: string }> = {
  draft: { label: 'Draft', glyph: '✎', hint: 'Only hosts and moderators see it.' },
  announced: {
    label: 'Announced',
    glyph: '✉',
    hint: 'Its page is public and followers have been told.',
  },
  live: { label: 'On the stove', glyph: '●', hint: 'The live session is running.' },
  sharing: {
    label: 'Sharing skeins',
    glyph: '⇪',
    hint: 'Viewers can share photos of their skeins.',
  },
  recap: { label: 'Recap', glyph: '★', hint: 'Pick and show the best skeins.' },
  archived: { label: 'Archived', glyph: '▣', hint: 'Kept for the record.' },
};

/** The words on the button that moves a dye-along to `to`. */
export const moveNames: Record<DyeAlongStatus, string> = {
  draft: 'Take it back to draft',
  announced: 'Announce and e-mail followers',
  live: 'Mark it on the stove',
  sharing: 'Open skein sharing',
  recap: 'Move on to the recap',
  archived: 'Archive it',
};
