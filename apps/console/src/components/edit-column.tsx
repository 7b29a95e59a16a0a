import type { ColumnDef } from '@tanstack/react-table';
import { Button } from '@vatside/ui/Button';

/** A column of an editable list: open a row in the form above to change it in place. */
export function editColumn<T extends { id: string; name: string }>(
  onEdit: (row: T) => void,
): ColumnDef<T> {
  return {
    id: 'edit',
    header: () => <span className="sr-only">Change</span>,
    cell: ({ row }) => (
      <Button
        variant="secondary"
        aria-label={`Change ${row.original.name}`}
        onClick={() => onEdit(row.original)}
      >
        Change
      </Button>
    ),
  };
}
