import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { memberListSchema, type Member } from '@vatside/contracts/members';
import type { StudioRole } from '@vatside/contracts/roles';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { meQueryOptions } from '@vatside/ui/session.ts';

const membersPath = (slug: string) => `/api/studios/${encodeURIComponent(slug)}/members`;

export const membersQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['studios', 'members', slug],
    queryFn: ({ signal }) => apiGet(membersPath(slug), memberListSchema, { signal }),
  });

/** Both changes answer with the whole new list; a change may also touch the asker's own role. */
function useMemberChange<V>(slug: string, send: (vars: V) => Promise<{ members: Member[] }>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (list) => {
      queryClient.setQueryData(membersQueryOptions(slug).queryKey, list);
      void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
      void queryClient.invalidateQueries({ queryKey: ['studios', 'detail', slug] });
    },
  });
}

export function useChangeRole(slug: string) {
  return useMemberChange(slug, ({ userId, role }: { userId: string; role: StudioRole }) =>
    apiSend(
      'PATCH',
      `${membersPath(slug)}/${encodeURIComponent(userId)}`,
      { role },
      memberListSchema,
    ),
  );
}

export function useRemoveMember(slug: string) {
  return useMemberChange(slug, (userId: string) =>
    apiSend(
      'DELETE',
      `${membersPath(slug)}/${encodeURIComponent(userId)}`,
      undefined,
      memberListSchema,
    ),
  );
}
