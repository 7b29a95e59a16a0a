import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { unsubscribeResultSchema } from '@vatside/contracts/mail-unsubscribe';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';

const unsubscribePath = (token: string) =>
  `/api/mail/unsubscribe?token=${encodeURIComponent(token)}`;

/** What an unsubscribe link is for: which studio, and whether its e-mails still come. */
export const unsubscribeQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['unsubscribe', token],
    queryFn: ({ signal }) => apiGet(unsubscribePath(token), unsubscribeResultSchema, { signal }),
  });

/** Stops the studio's e-mails at once; the answer replaces the description. */
export function useUnsubscribe(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend('POST', unsubscribePath(token), undefined, unsubscribeResultSchema),
    onSuccess: (result) =>
      queryClient.setQueryData(unsubscribeQueryOptions(token).queryKey, result),
  });
}
