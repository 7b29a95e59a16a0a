import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  invitationListSchema,
  invitationPreviewSchema,
  invitationSchema,
  type InvitationCreate,
} from '@vatside/contracts/members';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { meQueryOptions } from '@vatside/ui/session.ts';
import { z } from 'zod';

const invitationsPath = (slug: string) => `/api/studios/${encodeURIComponent(slug)}/invitations`;
const tokenPath = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;

export const invitationsQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['studios', 'invitations', slug],
    queryFn: ({ signal }) => apiGet(invitationsPath(slug), invitationListSchema, { signal }),
  });

export function useInvite(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invite: InvitationCreate) =>
      apiSend('POST', invitationsPath(slug), invite, invitationSchema),
    onSuccess: () => queryClient.invalidateQueries(invitationsQueryOptions(slug)),
  });
}

export function useRevokeInvitation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiSend('DELETE', `${invitationsPath(slug)}/${encodeURIComponent(id)}`),
    onSuccess: () => queryClient.invalidateQueries(invitationsQueryOptions(slug)),
  });
}

/** What an invitation link offers; readable before signing in. */
export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['invitations', token],
    queryFn: ({ signal }) => apiGet(tokenPath(token), invitationPreviewSchema, { signal }),
  });

const acceptedSchema = z.object({ studioSlug: z.string() });

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend('POST', `${tokenPath(token)}/accept`, undefined, acceptedSchema),
    // The new role shows in the header and the studio switcher.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey }),
  });
}
