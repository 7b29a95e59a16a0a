import { useMutation } from '@tanstack/react-query';
import { useHref } from 'react-router-dom';
import { authCall, authClient } from '../auth-client.ts';
import { Button } from '../Button.tsx';
import { withNext } from './next-path.ts';

/** Where a confirmation link brings the person back to, inside this app. */
export function useConfirmedHref(next: string | undefined) {
  return useHref(withNext('/confirmed', next));
}

/** Asks for a fresh confirmation link; the mail catcher or the inbox receives it. */
export function ResendLink({ email, next }: { email: string; next: string | undefined }) {
  const callbackURL = useConfirmedHref(next);
  const resend = useMutation({
    mutationFn: () => authCall(authClient.sendVerificationEmail({ email, callbackURL })),
  });
  return (
    <div className="space-y-2">
      <Button variant="secondary" onClick={() => resend.mutate()} disabled={resend.isPending}>
        {resend.isPending ? 'Sending…' : 'Send a new link'}
      </Button>
      <div aria-live="polite">
        {resend.isSuccess ? (
          <p className="font-bold">A new link is on its way to {email}.</p>
        ) : null}
        {resend.error ? <p className="font-bold text-madder-700">{resend.error.message}</p> : null}
      </div>
    </div>
  );
}
