import { useQuery } from '@tanstack/react-query';
import type { AuditEntry } from '@vatside/contracts/review';
import { createColumnHelper } from '@tanstack/react-table';
import { useSearchParams } from 'react-router-dom';
import { DataTable } from '../../../components/DataTable.tsx';
import { Pager } from '../../../components/Pager.tsx';
import { QueryView } from '../../../components/QueryView.tsx';
import { formatMoment } from '../../../lib/format.ts';
import { firstPage } from '../../../lib/studio-path.ts';
import { auditQueryOptions, reviewMonthsQueryOptions } from '../api.ts';
import { actionNames, statusNames } from '../names.ts';
import { MonthFilter } from './QueueFilters.tsx';

const column = createColumnHelper<AuditEntry>();

/** Every review decision, newest first: who, when, from which status to which, and why. */
export function AuditLog({ slug }: { slug: string }) {
  const [params, setParams] = useSearchParams();
  const dyeAlongId = params.get('dyeAlong') ?? undefined;
  const offset = Math.max(0, Number(params.get('offset')) || 0);
  const audit = useQuery(auditQueryOptions(slug, { dyeAlongId }, { ...firstPage, offset }));
  const months = useQuery(reviewMonthsQueryOptions(slug));
  const titles = new Map((months.data?.items ?? []).map((m) => [m.id, m.title]));

  const columns = [
    column.accessor('createdAt', {
      header: 'When',
      cell: (c) => <span className="whitespace-nowrap">{formatMoment(c.getValue())}</span>,
    }),
    column.accessor('actor', {
      header: 'Who',
      cell: (c) => c.getValue()?.name ?? 'A removed account',
    }),
    column.accessor('action', { header: 'Decision', cell: (c) => actionNames[c.getValue()] }),
    column.display({
      id: 'change',
      header: 'Status',
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {statusNames[row.original.fromStatus]}
          {' → '}
          {statusNames[row.original.toStatus]}
        </span>
      ),
    }),
    column.accessor('reason', { header: 'Reason', cell: (c) => c.getValue() ?? '—' }),
    column.display({
      id: 'skein',
      header: 'Skein',
      cell: ({ row }) => (
        <span className="block text-sm">
          {row.original.skein ? (
            <span className="block font-bold">
              {row.original.skein.baseName} by {row.original.skein.makerName ?? 'a removed account'}
            </span>
          ) : (
            <span className="block">A withdrawn skein</span>
          )}
          <span className="block whitespace-nowrap text-vat-800">
            {titles.get(row.original.dyeAlongId) ?? 'Dye-along'} · #
            {row.original.submissionId.slice(0, 8)}
          </span>
        </span>
      ),
    }),
  ];

  function setFilter(next: Partial<Record<'dyeAlong' | 'offset', string | undefined>>) {
    const merged = new URLSearchParams(params);
    for (const [key, value] of Object.entries({ offset: undefined, ...next })) {
      if (value) merged.set(key, value);
      else merged.delete(key);
    }
    setParams(merged, { replace: true });
  }

  return (
    <div className="space-y-4">
      <div className="max-w-md">
        <MonthFilter
          months={months.data?.items ?? []}
          value={dyeAlongId}
          onChange={(id) => setFilter({ dyeAlong: id })}
        />
      </div>
      <QueryView
        query={audit}
        loading="Reading the decisions…"
        failed="The decisions could not be loaded"
      >
        {(data) => (
          <div className="space-y-4">
            <DataTable
              caption="Review decisions, newest first"
              data={data.items}
              columns={columns}
              rowId={(entry) => entry.id}
              empty="No decisions yet."
            />
            <Pager
              page={data.page}
              noun="decisions"
              onOffset={(o) => setFilter({ offset: o ? String(o) : undefined })}
            />
          </div>
        )}
      </QueryView>
    </div>
  );
}
