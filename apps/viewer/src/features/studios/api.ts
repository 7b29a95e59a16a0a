import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  studioDetailSchema,
  studioListSchema,
  type StudioDetail,
} from '@vatside/contracts/studios';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { meQueryOptions } from '@vatside/ui/session.ts';

export const studiosQueryOptions = () =>
  queryOptions({
    queryKey: ['studios', 'list'],
    queryFn: ({ signal }) => apiGet('/api/studios', studioListSchema, { signal }),
  });

const studioPath = (slug: string) => `/api/studios/${encodeURIComponent(slug)}`;

/** A studio's public page, with the asker's role in it. */
export const studioQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['studios', 'detail', slug],
    queryFn: ({ signal }) => apiGet(studioPath(slug), studioDetailSchema, { signal }),
  });

/** Following, unfollowing and the mail choice all answer with the new page. */
function useFollowChange<V>(slug: string, send: (vars: V) => Promise<StudioDetail>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (studio) => {
      queryClient.setQueryData(studioQueryOptions(slug).queryKey, studio);
      // The header shows the role, which following just changed.
      void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
    },
  });
}

/** Follow, or change the e-mail choice of someone already following. */
export function useFollow(slug: string) {
  return useFollowChange(slug, (mailOptIn: boolean) =>
    apiSend('PUT', `${studioPath(slug)}/follow`, { mailOptIn }, studioDetailSchema),
  );
}

export function useUnfollow(slug: string) {
  return useFollowChange(slug, () =>
    apiSend('DELETE', `${studioPath(slug)}/follow`, undefined, studioDetailSchema),
  );
}
