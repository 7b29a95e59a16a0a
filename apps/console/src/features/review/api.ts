import { keepPreviousData, queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  auditListSchema,
  bulkResultSchema,
  reviewQueueSchema,
  reviewSubmissionSchema,
  type ReviewAction,
  type ReviewQueue,
  type ReasonTemplateId,
} from '@vatside/contracts/review';
import { dyeAlongListSchema } from '@vatside/contracts/dye-alongs';
import type { SubmissionStatus } from '@vatside/contracts/submissions';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { pickerPage, studioApi, withPage, type PageAt } from '../../lib/studio-path.ts';

const reviewKey = (slug: string) => ['review', slug] as const;

export interface QueueFilter {
  status: SubmissionStatus;
  dyeAlongId?: string | undefined;
}

const filterQuery = (filter: { dyeAlongId?: string | undefined }) =>
  filter.dyeAlongId ? `&dyeAlongId=${encodeURIComponent(filter.dyeAlongId)}` : '';

/** The skeins in one status, oldest waiting first (the server's order). */
export const reviewQueueQueryOptions = (slug: string, filter: QueueFilter, page: PageAt) =>
  queryOptions({
    queryKey: [...reviewKey(slug), 'queue', filter, page],
    queryFn: ({ signal }) =>
      apiGet(
        `${withPage(studioApi(slug, 'review', 'submissions'), page)}&status=${filter.status}${filterQuery(filter)}`,
        reviewQueueSchema,
        { signal },
      ),
    placeholderData: keepPreviousData,
  });

/** How many skeins wait, for the navigation (one row fetched, the total read). */
export const waitingCountQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: [...reviewKey(slug), 'waiting-count'],
    queryFn: ({ signal }) =>
      apiGet(
        `${withPage(studioApi(slug, 'review', 'submissions'), { limit: 1, offset: 0 })}&status=waiting`,
        reviewQueueSchema,
        { signal },
      ),
    select: (queue) => queue.page.total,
  });

export const auditQueryOptions = (
  slug: string,
  filter: { dyeAlongId?: string | undefined },
  page: PageAt,
) =>
  queryOptions({
    queryKey: [...reviewKey(slug), 'audit', filter, page],
    queryFn: ({ signal }) =>
      apiGet(
        `${withPage(studioApi(slug, 'review', 'audit'), page)}${filterQuery(filter)}`,
        auditListSchema,
        { signal },
      ),
    placeholderData: keepPreviousData,
  });

/** Every dye-along of the studio, newest first, for the filters. */
export const reviewMonthsQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: [...reviewKey(slug), 'months'],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'dye-alongs'), pickerPage), dyeAlongListSchema, { signal }),
  });

export interface DecisionInput {
  decision: ReviewAction;
  reason?: string;
  reasonTemplate?: ReasonTemplateId;
}

/** Every decision changes a skein's status, so it leaves the list it was decided from. */
function withoutDecided(queue: ReviewQueue | undefined, ids: Set<string>) {
  if (!queue) return queue;
  const items = queue.items.filter((s) => !ids.has(s.id));
  const gone = queue.items.length - items.length;
  return { items, page: { ...queue.page, total: queue.page.total - gone } };
}

/**
 * A decision on one or several skeins. Optimistic: the skeins leave the queue at once; a refusal
 * puts them back and the server's message is shown; either way the queue is fetched afresh.
 */
function useReviewChange<V, R>(
  slug: string,
  ids: (vars: V) => string[],
  send: (vars: V) => Promise<R>,
) {
  const queryClient = useQueryClient();
  const queues = { queryKey: [...reviewKey(slug), 'queue'] };
  return useMutation({
    mutationFn: send,
    onMutate: async (vars) => {
      await queryClient.cancelQueries(queues);
      const before = queryClient.getQueriesData<ReviewQueue>(queues);
      const decided = new Set(ids(vars));
      for (const [key, queue] of before)
        queryClient.setQueryData(key, withoutDecided(queue, decided));
      return { before };
    },
    onError: (_error, _vars, context) => {
      for (const [key, queue] of context?.before ?? []) queryClient.setQueryData(key, queue);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: reviewKey(slug) }),
  });
}

export function useDecide(slug: string) {
  return useReviewChange(
    slug,
    (vars: { submissionId: string } & DecisionInput) => [vars.submissionId],
    ({ submissionId, ...decision }) =>
      apiSend(
        'POST',
        studioApi(slug, 'review', 'submissions', submissionId, 'decisions'),
        decision,
        reviewSubmissionSchema,
      ),
  );
}

export function useDecideMany(slug: string) {
  return useReviewChange(
    slug,
    (vars: { submissionIds: string[] } & DecisionInput) => vars.submissionIds,
    (body) => apiSend('POST', studioApi(slug, 'review', 'decisions'), body, bulkResultSchema),
  );
}
