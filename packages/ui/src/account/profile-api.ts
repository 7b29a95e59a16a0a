import { useMutation, useQueryClient } from '@tanstack/react-query';
import { profileSchema, type ProfileUpdate } from '@vatside/contracts/account';
import { apiSend } from '../api-client.ts';
import { meQueryOptions } from '../session.ts';

export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: ProfileUpdate) =>
      apiSend('PATCH', '/api/me/profile', changes, profileSchema),
    onSuccess: (profile) =>
      queryClient.setQueryData(meQueryOptions().queryKey, (me) => (me ? { ...me, profile } : me)),
  });
}
