import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { authCall, authClient } from '../auth-client.ts';
import { forgetSession } from '../session.ts';

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: () => authCall(authClient.signOut()),
    onSuccess: () => {
      navigate('/');
      forgetSession(queryClient);
    },
  });
}
