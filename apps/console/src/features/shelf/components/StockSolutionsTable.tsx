import { createColumnHelper } from '@tanstack/react-table';
import type { StockSolution } from '@vatside/contracts/workbench-shelf';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { Swatch } from '@vatside/ui/Swatch';
import { useMemo, useState } from 'react';
import { DataTable } from '../../../components/DataTable.tsx';
import { TwoPressButton } from '../../../components/TwoPressButton.tsx';
import { formatAmount, formatDay, formatPct } from '../../../lib/format.ts';
import { useDeleteStockSolution } from '../api.ts';
import { StockJar } from './StockJar.tsx';

const column = createColumnHelper<StockSolution>();

/**
 * Every jar of stock: strength, made, left; pick one to adjust it or see its history, or to
 * correct how it was recorded ("Change", in the form below).
 */
export function StockSolutionsTable({
  slug,
  stocks,
  canEdit,
  onEdit,
}: {
  slug: string;
  stocks: StockSolution[];
  canEdit: boolean;
  onEdit: (stock: StockSolution) => void;
}) {
  const remove = useDeleteStockSolution(slug);
  const { mutate } = remove;
  const [openId, setOpenId] = useState<string>();
  const open = stocks.find((s) => s.id === openId);
  const columns = useMemo(
    () => [
      column.accessor('dyeName', {
        header: 'Dye',
        cell: ({ row }) => <Swatch hex={row.original.swatchHex} label={row.original.dyeName} />,
      }),
      column.accessor('stockStrengthPct', {
        header: 'Strength',
        cell: ({ getValue }) => `${formatPct(getValue())} w/v`,
      }),
      column.accessor('volumeMadeMl', {
        header: 'Made',
        cell: ({ getValue }) => `${formatAmount(getValue())} mL`,
      }),
      column.accessor('madeOn', {
        header: 'Made on',
        cell: ({ getValue }) => <time dateTime={getValue()}>{formatDay(getValue())}</time>,
      }),
      column.accessor('volumeLeftMl', {
        header: 'Left',
        cell: ({ row }) => (
          <>
            <span className="font-bold">{formatAmount(row.original.volumeLeftMl)} mL</span>
            <span className="block text-sm text-vat-800">
              {formatAmount(row.original.dyeLeftG)} g of dye
            </span>
          </>
        ),
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => (
          <div className="flex flex-wrap gap-2">
            <Button
              variant="secondary"
              aria-expanded={openId === row.original.id}
              onClick={() => setOpenId(openId === row.original.id ? undefined : row.original.id)}
            >
              {canEdit ? 'Adjust & history' : 'History'}
              <span className="sr-only"> of {row.original.dyeName}</span>
            </Button>
            {canEdit ? (
              <Button
                variant="secondary"
                aria-label={`Change the ${row.original.dyeName} ${formatPct(row.original.stockStrengthPct)} jar`}
                onClick={() => onEdit(row.original)}
              >
                Change
              </Button>
            ) : null}
            {canEdit ? (
              <TwoPressButton
                label={`Delete ${row.original.dyeName} ${formatPct(row.original.stockStrengthPct)}`}
                confirm="Yes, delete"
                onConfirm={() => mutate(row.original.id)}
              />
            ) : null}
          </div>
        ),
      }),
    ],
    [canEdit, mutate, onEdit, openId],
  );
  return (
    <div className="space-y-3">
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <DataTable
        caption="Stock solutions"
        data={stocks}
        columns={columns}
        rowId={(stock) => stock.id}
        empty="No stock solutions yet. Mix one from a dye on the shelf and record it below."
      />
      {open ? (
        <StockJar slug={slug} stock={open} canEdit={canEdit} onClose={() => setOpenId(undefined)} />
      ) : null}
    </div>
  );
}
