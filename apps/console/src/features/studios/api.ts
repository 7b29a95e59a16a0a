import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  studioDetailSchema,
  studioListSchema,
  studioSummarySchema,
  type StudioCreate,
} from '@vatside/contracts/studios';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { meQueryOptions } from '@vatside/ui/session.ts';

export const studiosQueryOptions = () =>
  queryOptions({
    queryKey: ['studios', 'list'],
    queryFn: ({ signal }) => apiGet('/api/studios', studioListSchema, { signal }),
  });

/** One studio with the asker's role in it. */
export const studioQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['studios', 'detail', slug],
    queryFn: ({ signal }) =>
      apiGet(`/api/studios/${encodeURIComponent(slug)}`, studioDetailSchema, { signal }),
  });

export function useStartStudio() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (studio: StudioCreate) =>
      apiSend('POST', '/api/studios', studio, studioSummarySchema),
    // The creator is now a host: their memberships and the studio list both changed.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: studiosQueryOptions().queryKey }),
      ]),
  });
}
