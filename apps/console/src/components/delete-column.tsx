import type { ColumnDef } from '@tanstack/react-table';
import { TwoPressButton } from './TwoPressButton.tsx';

/** The last column of an editable list: delete a row, with a second press to confirm. */
export function deleteColumn<T extends { id: string; name: string }>(
  onDelete: (id: string) => void,
): ColumnDef<T> {
  return {
    id: 'delete',
    header: () => <span className="sr-only">Delete</span>,
    cell: ({ row }) => (
      <TwoPressButton
        label={`Delete ${row.original.name}`}
        confirm="Yes, delete"
        onConfirm={() => onDelete(row.original.id)}
      />
    ),
  };
}
