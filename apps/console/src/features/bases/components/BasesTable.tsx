import { createColumnHelper } from '@tanstack/react-table';
import type { Base } from '@vatside/contracts/workbench-bases';
import { convert } from '@vatside/dye-kit';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { WarningList } from '@vatside/ui/WarningList';
import { useMemo } from 'react';
import { DataTable } from '../../../components/DataTable.tsx';
import { deleteColumn } from '../../../components/delete-column.tsx';
import { editColumn } from '../../../components/edit-column.tsx';
import { formatAmount } from '../../../lib/format.ts';
import { useDeleteBase } from '../api.ts';
import { fiberNames, weightClassNames } from './names.ts';

const column = createColumnHelper<Base>();

export function BasesTable({
  slug,
  bases,
  canEdit,
  onEdit,
}: {
  slug: string;
  bases: Base[];
  canEdit: boolean;
  /** Opens a row in the form to change it. */
  onEdit: (row: Base) => void;
}) {
  const remove = useDeleteBase(slug);
  const { mutate } = remove;
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Base',
        cell: ({ row }) => (
          <>
            <span className="font-bold">{row.original.name}</span>
            {row.original.lot ? (
              <span className="block text-sm text-vat-800">Lot {row.original.lot}</span>
            ) : null}
          </>
        ),
      }),
      column.accessor('fiberContent', {
        header: 'Fiber',
        cell: ({ row }) => (
          <>
            {row.original.fiberContent
              .map((f) => `${formatAmount(f.pct)} % ${fiberNames[f.fiber].toLowerCase()}`)
              .join(', ')}
            <span className="block text-sm text-vat-800">
              {row.original.superwash ? 'Superwash' : 'Not superwash'}
            </span>
          </>
        ),
      }),
      column.accessor('weightClass', {
        header: 'Weight',
        cell: ({ getValue }) => (
          <span className="whitespace-nowrap">
            {getValue()} · {weightClassNames[getValue()] ?? ''}
          </span>
        ),
      }),
      column.accessor('skeinWeightG', {
        header: 'Skein',
        cell: ({ row }) => (
          <>
            {formatAmount(row.original.skeinWeightG)} g ·{' '}
            <span className="whitespace-nowrap">
              {formatAmount(row.original.skeinLengthM)} m (
              {formatAmount(convert(row.original.skeinLengthM, 'm', 'yd'))} yd)
            </span>
          </>
        ),
      }),
      column.accessor('fiberCheck', {
        header: 'Fiber check',
        cell: ({ row }) => (
          <div className="min-w-64 space-y-2">
            <p>
              {formatAmount(row.original.fiberCheck.takesDyePct)} % takes acid dye and food color.
            </p>
            <WarningList
              warnings={row.original.fiberCheck.warnings}
              title={`Fiber notes for ${row.original.name}`}
            />
          </div>
        ),
      }),
      ...(canEdit ? [editColumn<Base>(onEdit), deleteColumn<Base>(mutate)] : []),
    ],
    [canEdit, mutate, onEdit],
  );
  return (
    <div className="space-y-3">
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <DataTable
        caption="Yarn bases"
        data={bases}
        columns={columns}
        rowId={(b) => b.id}
        empty="No bases yet. Add the yarn you dye most below."
      />
    </div>
  );
}
