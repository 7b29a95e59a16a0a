import type { DyeAlongStatus } from '@vatside/contracts/dye-alongs';
import { cx } from '@vatside/ui/cx.ts';
import { statusNames } from './names.ts';

const tones: Record<DyeAlongStatus, string> = {
  draft: 'border-vat-800 bg-wool-50 text-vat-900',
  announced: 'border-vat-700 bg-vat-100 text-vat-900',
  live: 'border-madder-700 bg-madder-100 text-madder-800',
  sharing: 'border-leaf-700 bg-leaf-100 text-leaf-800',
  recap: 'border-marigold-500 bg-marigold-100 text-vat-950',
  archived: 'border-wool-300 bg-wool-200 text-vat-950',
};

/** The status as a word with a glyph; the color only repeats it. */
export function StatusBadge({ status }: { status: DyeAlongStatus }) {
  const { label, glyph } = statusNames[status];
  return (
    <span
      className={cx(
        'inline-flex items-center gap-1.5 rounded-full border-2 px-3 py-0.5 text-sm font-bold whitespace-nowrap',
        tones[status],
      )}
    >
      <span aria-hidden="true">{glyph}</span>
      {label}
    </span>
  );
}
