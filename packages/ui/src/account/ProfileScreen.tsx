import { Button } from '../Button.tsx';
import { Card } from '../Card.tsx';
import { useMe } from '../session.ts';
import { DeleteAccountPanel } from './DeleteAccountPanel.tsx';
import { ProfileForm } from './ProfileForm.tsx';
import { RequireSignIn } from './RequireSignIn.tsx';
import { useSignOut } from './use-sign-out.ts';

export function ProfileScreen() {
  return (
    <RequireSignIn>
      <ProfileSections />
    </RequireSignIn>
  );
}

function ProfileSections() {
  const { data: me } = useMe();
  const signOut = useSignOut();
  if (!me) return null;
  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="font-display text-4xl font-semibold">Your profile</h1>
          <p className="text-lg text-vat-800">Signed in as {me.profile.email}</p>
        </div>
        <Button variant="secondary" onClick={() => signOut.mutate()} disabled={signOut.isPending}>
          {signOut.isPending ? 'Signing out…' : 'Sign out'}
        </Button>
      </div>
      {signOut.error ? <p role="alert">{signOut.error.message}</p> : null}
      <Card as="section" aria-label="Profile settings">
        <ProfileForm profile={me.profile} />
      </Card>
      <DeleteAccountPanel />
    </div>
  );
}
