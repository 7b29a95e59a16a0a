import { useQuery } from '@tanstack/react-query';
import type { StockSolution } from '@vatside/contracts/workbench-shelf';
import { Button } from '@vatside/ui/Button';
import { QueryView } from '../../../components/QueryView.tsx';
import { formatAmount, formatMoment, formatPct } from '../../../lib/format.ts';
import { stockSolutionQueryOptions } from '../api.ts';
import { AdjustStockForm } from './AdjustStockForm.tsx';

/** One jar opened: set what is left, and the record of every earlier change. */
export function StockJar({
  slug,
  stock,
  canEdit,
  onClose,
}: {
  slug: string;
  stock: StockSolution;
  canEdit: boolean;
  onClose: () => void;
}) {
  const detail = useQuery(stockSolutionQueryOptions(slug, stock.id));
  const title = `${stock.dyeName}, ${formatPct(stock.stockStrengthPct)}`;
  return (
    <section
      aria-label={`Jar: ${title}`}
      className="space-y-4 rounded-card border-2 border-vat-600 bg-white p-4"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-xl font-bold">Jar: {title}</h3>
        <Button variant="secondary" onClick={onClose}>
          Close
        </Button>
      </div>
      {canEdit ? (
        <AdjustStockForm key={stock.volumeLeftMl} slug={slug} stock={stock} onDone={onClose} />
      ) : null}
      <QueryView
        query={detail}
        loading="Reading the jar’s history…"
        failed="The jar’s history could not be loaded"
      >
        {(jar) =>
          jar.adjustments.length === 0 ? (
            <p>No changes by hand yet.</p>
          ) : (
            <div>
              <h4 className="font-bold">Changes by hand</h4>
              <ul className="divide-y divide-wool-200">
                {jar.adjustments.map((a) => (
                  <li key={a.id} className="py-2">
                    <span className="font-bold">
                      {formatAmount(a.volumeLeftBeforeMl)} mL → {formatAmount(a.volumeLeftAfterMl)}{' '}
                      mL
                    </span>{' '}
                    · {a.reason}
                    <span className="block text-sm text-vat-800">
                      {formatMoment(a.createdAt)}
                      {a.adjustedByName ? ` · ${a.adjustedByName}` : ''}
                    </span>
                  </li>
                ))}
              </ul>
            </div>
          )
        }
      </QueryView>
    </section>
  );
}
