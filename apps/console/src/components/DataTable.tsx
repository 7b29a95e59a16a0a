import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';

/** A plain list table: caption for screen readers, scrolls sideways on a phone. */
export function DataTable<T>({
  caption,
  data,
  columns,
  rowId,
  empty,
}: {
  caption: string;
  data: T[];
  // Columns mix value types; react-table's own helper types them per column.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  rowId: (row: T) => string;
  empty: string;
}) {
  const table = useReactTable({
    data,
    columns,
    getRowId: rowId,
    getCoreRowModel: getCoreRowModel(),
  });
  if (data.length === 0) {
    return (
      <p className="rounded-card border border-dashed border-wool-300 bg-wool-50 p-5 text-lg">
        {empty}
      </p>
    );
  }
  return (
    <div className="overflow-x-auto rounded-card border border-wool-200 bg-wool-50">
      <table className="w-full text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b-2 border-vat-800">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-3 py-2 whitespace-nowrap">
                  {flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-wool-200">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-top">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
