import { createColumnHelper } from '@tanstack/react-table';
import type { ColorwaySummary } from '@vatside/contracts/workbench-colorways';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Swatch } from '@vatside/ui/Swatch';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/DataTable.tsx';
import { deleteColumn } from '../../../components/delete-column.tsx';
import { formatAmount } from '../../../lib/format.ts';
import { useDeleteColorway } from '../api.ts';
import { techniqueNames } from './names.ts';

const column = createColumnHelper<ColorwaySummary>();

export function ColorwaysTable({
  slug,
  colorways,
  canEdit,
}: {
  slug: string;
  colorways: ColorwaySummary[];
  canEdit: boolean;
}) {
  const remove = useDeleteColorway(slug);
  const { mutate } = remove;
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Colorway',
        cell: ({ row }) => (
          <Link to={row.original.id} className={textLinkClass}>
            {row.original.name}
          </Link>
        ),
      }),
      column.accessor('technique', {
        header: 'Technique',
        cell: ({ getValue }) => techniqueNames[getValue()],
      }),
      column.accessor('targetSwatches', {
        header: 'Aims at',
        cell: ({ getValue }) =>
          getValue().length === 0 ? (
            <span className="text-vat-800">Not chosen</span>
          ) : (
            <span className="flex flex-wrap gap-2">
              {getValue().map((s) => (
                <Swatch key={s.hex} hex={s.hex} label={s.name || s.hex} />
              ))}
            </span>
          ),
      }),
      column.accessor('recipeLines', {
        header: 'Recipe',
        cell: ({ row }) =>
          `${row.original.recipeLines.length} line${row.original.recipeLines.length === 1 ? '' : 's'} · ${row.original.skeinCount} × ${formatAmount(row.original.weightOfGoodsG)} g`,
      }),
      ...(canEdit ? [deleteColumn<ColorwaySummary>(mutate)] : []),
    ],
    [canEdit, mutate],
  );
  return (
    <div className="space-y-3">
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <DataTable
        caption="Colorways"
        data={colorways}
        columns={columns}
        rowId={(c) => c.id}
        empty="No colorways yet. Start one below."
      />
    </div>
  );
}
