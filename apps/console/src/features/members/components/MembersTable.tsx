import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from '@tanstack/react-table';
import type { Member } from '@vatside/contracts/members';
import { studioRoles, type StudioRole } from '@vatside/contracts/roles';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { useMemo, useState } from 'react';
import { useChangeRole, useRemoveMember } from '../api.ts';
import { RemoveMemberCell } from './RemoveMemberCell.tsx';
import { roleNames } from './role-names.ts';
import { SortButton } from './SortButton.tsx';

const joinedFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium' });
const column = createColumnHelper<Member>();

/** Everyone in the studio. Hosts get role and removal controls; moderators read only. */
export function MembersTable({
  slug,
  members,
  canManage,
}: {
  slug: string;
  members: Member[];
  canManage: boolean;
}) {
  const changeRole = useChangeRole(slug);
  const removeMember = useRemoveMember(slug);
  const { mutate: setRole } = changeRole;
  const { mutate: remove } = removeMember;
  const busyUserId = changeRole.isPending
    ? changeRole.variables.userId
    : removeMember.isPending
      ? removeMember.variables
      : undefined;
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const [search, setSearch] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('role', {
        header: 'Role',
        filterFn: 'equalsString',
        enableGlobalFilter: false,
        cell: ({ row, getValue }) =>
          canManage ? (
            <select
              aria-label={`Role of ${row.original.name}`}
              value={getValue()}
              disabled={busyUserId === row.original.userId}
              onChange={(event) =>
                setRole({
                  userId: row.original.userId,
                  role: event.target.value as StudioRole,
                })
              }
              className="min-h-12 rounded-lg border-2 border-vat-800 bg-white px-3 font-bold"
            >
              {studioRoles.map((role) => (
                <option key={role} value={role}>
                  {roleNames[role]}
                </option>
              ))}
            </select>
          ) : (
            roleNames[getValue()]
          ),
      }),
      column.accessor('mailOptIn', {
        header: 'E-mail opt-in',
        enableGlobalFilter: false,
        cell: ({ getValue }) => (getValue() ? 'Yes' : 'No'),
      }),
      column.accessor('joinedAt', {
        header: 'Joined',
        sortingFn: 'text',
        enableGlobalFilter: false,
        cell: ({ getValue }) => (
          <time dateTime={getValue()}>{joinedFormat.format(new Date(getValue()))}</time>
        ),
      }),
      ...(canManage
        ? [
            column.display({
              id: 'remove',
              header: () => <span className="sr-only">Remove</span>,
              cell: ({ row }) => (
                <RemoveMemberCell
                  name={row.original.name}
                  busy={busyUserId === row.original.userId}
                  onRemove={() => remove(row.original.userId)}
                />
              ),
            }),
          ]
        : []),
    ],
    [canManage, busyUserId, setRole, remove],
  );

  const table = useReactTable({
    data: members,
    columns,
    state: { sorting, globalFilter: search, columnFilters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    onColumnFiltersChange: setColumnFilters,
    globalFilterFn: 'includesString',
    getRowId: (member) => member.userId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const rows = table.getRowModel().rows;
  const roleFilter = (table.getColumn('role')?.getFilterValue() as string | undefined) ?? '';
  const failure = changeRole.error ?? removeMember.error;

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-4">
        <TextField
          label="Find a member"
          hint="By name or e-mail."
          type="search"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
          className="min-w-64 flex-1"
        />
        <SelectField
          label="Show"
          value={roleFilter}
          onChange={(event) =>
            table.getColumn('role')?.setFilterValue(event.target.value || undefined)
          }
          className="w-56"
        >
          <option value="">Every role</option>
          {studioRoles.map((role) => (
            <option key={role} value={role}>
              {roleNames[role]}s only
            </option>
          ))}
        </SelectField>
      </div>
      {failure ? <FormAlert>{failure.message}</FormAlert> : null}
      <p aria-live="polite" className="text-vat-800">
        Showing {rows.length} of {members.length} members
      </p>
      <div className="overflow-x-auto rounded-card border border-wool-200 bg-wool-50">
        <table className="w-full text-left">
          <caption className="sr-only">
            Studio members{canManage ? '; change a role or remove someone in their row' : ''}
          </caption>
          <thead className="border-b-2 border-vat-800">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc'
                          ? 'ascending'
                          : sorted === 'desc'
                            ? 'descending'
                            : undefined
                      }
                      className="px-2 py-1 whitespace-nowrap"
                    >
                      {header.column.getCanSort() ? (
                        <SortButton
                          sorted={sorted}
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                        </SortButton>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-wool-200">
            {rows.map((row) => (
              <tr key={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-2 py-2 align-middle whitespace-nowrap">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? (
          <p className="p-4 text-lg">No member matches. Clear the search or pick another role.</p>
        ) : null}
      </div>
    </div>
  );
}
