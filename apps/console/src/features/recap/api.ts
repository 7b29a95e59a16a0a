import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { recapSchema, type RecapUpdate } from '@vatside/contracts/gallery';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi } from '../../lib/studio-path.ts';

const recapPath = (slug: string, dyeAlongId: string) =>
  studioApi(slug, 'dye-alongs', dyeAlongId, 'recap');

/** The running order and what may still enter it (moderators read it, the host edits). */
export const recapQueryOptions = (slug: string, dyeAlongId: string) =>
  queryOptions({
    queryKey: ['recap', slug, dyeAlongId],
    queryFn: ({ signal }) => apiGet(recapPath(slug, dyeAlongId), recapSchema, { signal }),
  });

export function useSaveRecap(slug: string, dyeAlongId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (update: RecapUpdate) =>
      apiSend('PUT', recapPath(slug, dyeAlongId), update, recapSchema),
    onSuccess: (recap) =>
      queryClient.setQueryData(recapQueryOptions(slug, dyeAlongId).queryKey, recap),
  });
}

export const presenterPath = (slug: string, dyeAlongId: string) =>
  `/studios/${slug}/dye-alongs/${dyeAlongId}/presenter`;
