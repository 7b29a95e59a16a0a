import { cx } from './cx.ts';

export type WarningItem = {
  code: string;
  severity: 'info' | 'warning' | 'critical';
  message: string;
};

// The word and the glyph carry the severity; the color only repeats it.
const looks = {
  critical: { word: 'Stop', glyph: '✕', className: 'border-madder-700 bg-madder-100' },
  warning: { word: 'Careful', glyph: '⚠', className: 'border-marigold-500 bg-marigold-100' },
  info: { word: 'Note', glyph: 'ℹ', className: 'border-vat-600 bg-vat-100' },
} as const;

const order = { critical: 0, warning: 1, info: 2 } as const;

/** dye-kit's warnings, most serious first, each with its severity in words. */
export function WarningList({
  warnings,
  title = 'Worth knowing before you dye',
  className,
}: {
  warnings: readonly WarningItem[];
  title?: string;
  className?: string;
}) {
  if (warnings.length === 0) return null;
  const sorted = [...warnings].sort((a, b) => order[a.severity] - order[b.severity]);
  return (
    <section aria-label={title} className={cx('space-y-2', className)}>
      <h3 className="font-bold">{title}</h3>
      <ul className="space-y-2">
        {sorted.map((warning, i) => {
          const look = looks[warning.severity];
          return (
            <li
              key={`${warning.code}-${i}`}
              className={cx('rounded-xl border-2 border-l-8 p-3 text-vat-950', look.className)}
            >
              <span className="font-bold">
                <span aria-hidden="true">{look.glyph} </span>
                {look.word}:
              </span>{' '}
              {warning.message}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
