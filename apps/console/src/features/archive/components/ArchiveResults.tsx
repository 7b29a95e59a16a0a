import type { ArchivedColorwaySummary } from '@vatside/contracts/archive';
import { formatQuantity } from '@vatside/ui/supplies/format.ts';
import { Swatch } from '@vatside/ui/Swatch';
import { Link } from 'react-router-dom';

/** Archived colorways as cards: swatches with their names, the month, base and dyes. */
export function ArchiveResults({
  items,
  byColor,
}: {
  items: ArchivedColorwaySummary[];
  byColor: boolean;
}) {
  if (items.length === 0) {
    return <p>Nothing in the archive matches. Try fewer filters, or archive a finished month.</p>;
  }
  return (
    <ol aria-label="Archived colorways" className="grid gap-4 lg:grid-cols-2">
      {items.map((item) => (
        <li key={item.id} className="space-y-3 rounded-card border-2 border-wool-300 bg-white p-4">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <h3 className="font-display text-2xl font-semibold">
              <Link
                to={item.id}
                className="underline-offset-4 hover:underline focus-visible:underline"
              >
                {item.colorwayName}
              </Link>
            </h3>
            {byColor && item.deltaE2000 !== null ? (
              <span className="rounded-lg bg-vat-100 px-2 py-1 font-bold text-vat-900">
                ΔE2000 {formatQuantity(item.deltaE2000)} from your color
              </span>
            ) : null}
          </div>
          <p>
            {item.dyeAlongTitle} · {item.monthLabel}
            {item.baseName ? ` · ${item.baseName}` : ''}
          </p>
          {item.swatches.length ? (
            <ul aria-label="Swatches" className="flex flex-wrap gap-x-5 gap-y-2">
              {item.swatches.map((s) => (
                <li key={`${s.hex}-${s.name}`}>
                  <Swatch hex={s.hex} label={s.name || s.hex} showHex />
                </li>
              ))}
            </ul>
          ) : (
            <p>No swatches were set for this colorway.</p>
          )}
          <p className="text-sm text-vat-800">Dyes: {item.dyeNames.join(', ') || 'none'}</p>
        </li>
      ))}
    </ol>
  );
}
