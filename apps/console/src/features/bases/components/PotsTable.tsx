import { createColumnHelper } from '@tanstack/react-table';
import type { Pot } from '@vatside/contracts/workbench-bases';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { StatusPill } from '@vatside/ui/StatusPill';
import { useMemo } from 'react';
import { DataTable } from '../../../components/DataTable.tsx';
import { deleteColumn } from '../../../components/delete-column.tsx';
import { editColumn } from '../../../components/edit-column.tsx';
import { useDeletePot } from '../api.ts';
import { capacityLabel } from './capacity.ts';
import { potMaterialNames } from './names.ts';

const column = createColumnHelper<Pot>();

export function PotsTable({
  slug,
  pots,
  canEdit,
  onEdit,
}: {
  slug: string;
  pots: Pot[];
  canEdit: boolean;
  /** Opens a row in the form to change it. */
  onEdit: (row: Pot) => void;
}) {
  const remove = useDeletePot(slug);
  const { mutate } = remove;
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Pot',
        cell: ({ getValue }) => <span className="font-bold">{getValue()}</span>,
      }),
      column.accessor('capacityMl', {
        header: 'Capacity',
        cell: ({ getValue }) => capacityLabel(getValue()),
      }),
      column.accessor('material', {
        header: 'Material',
        cell: ({ row }) => (
          <span className="flex flex-wrap items-center gap-2">
            {potMaterialNames[row.original.material]}
            {row.original.reactsWithAcid ? (
              <StatusPill tone="fail">Reacts with acid</StatusPill>
            ) : null}
          </span>
        ),
      }),
      ...(canEdit ? [editColumn<Pot>(onEdit), deleteColumn<Pot>(mutate)] : []),
    ],
    [canEdit, mutate, onEdit],
  );
  return (
    <div className="space-y-3">
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <DataTable
        caption="Dye pots"
        data={pots}
        columns={columns}
        rowId={(p) => p.id}
        empty="No pots yet. Add the pot you dye in below."
      />
    </div>
  );
}
