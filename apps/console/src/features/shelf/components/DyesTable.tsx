import { createColumnHelper } from '@tanstack/react-table';
import type { Dye } from '@vatside/contracts/workbench-shelf';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { Swatch } from '@vatside/ui/Swatch';
import { useMemo } from 'react';
import { DataTable } from '../../../components/DataTable.tsx';
import { deleteColumn } from '../../../components/delete-column.tsx';
import { editColumn } from '../../../components/edit-column.tsx';
import { useDeleteDye } from '../api.ts';
import { dyeKindNames } from './kind-names.ts';

const column = createColumnHelper<Dye>();

export function DyesTable({
  slug,
  dyes,
  canEdit,
  onEdit,
}: {
  slug: string;
  dyes: Dye[];
  canEdit: boolean;
  /** Opens a row in the form to change it. */
  onEdit: (row: Dye) => void;
}) {
  const remove = useDeleteDye(slug);
  const { mutate } = remove;
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Dye',
        cell: ({ row }) => (
          <Swatch hex={row.original.swatchHex} label={row.original.name} showHex />
        ),
      }),
      column.accessor('kind', { header: 'Kind', cell: ({ getValue }) => dyeKindNames[getValue()] }),
      column.accessor('colorants', {
        header: 'Colorants',
        cell: ({ getValue }) =>
          getValue().length === 0 ? (
            <span className="text-vat-800">Not listed</span>
          ) : (
            <ul>
              {getValue().map((c) => (
                <li key={c.id}>
                  {c.fdcName} <span className="text-vat-800">({c.euNumber})</span>
                </li>
              ))}
            </ul>
          ),
      }),
      ...(canEdit ? [editColumn<Dye>(onEdit), deleteColumn<Dye>(mutate)] : []),
    ],
    [canEdit, mutate, onEdit],
  );
  return (
    <div className="space-y-3">
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <DataTable
        caption="Dyes on the shelf"
        data={dyes}
        columns={columns}
        rowId={(dye) => dye.id}
        empty="No dyes on the shelf yet. Add the first one below."
      />
    </div>
  );
}
