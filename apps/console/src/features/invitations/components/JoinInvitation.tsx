import { useQuery } from '@tanstack/react-query';
import type { InvitationPreview, InvitationStatus } from '@vatside/contracts/members';
import { withNext } from '@vatside/ui/account/next-path.ts';
import { Button, buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Swatch } from '@vatside/ui/Swatch';
import { useMe } from '@vatside/ui/session.ts';
import { Link, useNavigate } from 'react-router-dom';
import { invitationPreviewQueryOptions, useAcceptInvitation } from '../api.ts';

const spentWords: Record<Exclude<InvitationStatus, 'waiting'>, string> = {
  accepted: 'This invitation was used already. If it was you, the studio is in your console.',
  revoked: 'The host withdrew this invitation. Ask them for a new one if you still want to help.',
  expired: 'This invitation ran out. Ask the host to send a new one.',
};

/** The page an invitation mail links to: what is offered, then a way to take it. */
export function JoinInvitation({ token }: { token: string }) {
  const preview = useQuery(invitationPreviewQueryOptions(token));
  if (preview.isPending) return <LoadingBlock label="Opening the invitation…" />;
  if (preview.error) {
    return (
      <ErrorPanel
        title="This invitation could not be opened"
        error={preview.error}
        onRetry={() => void preview.refetch()}
        retrying={preview.isFetching}
      />
    );
  }
  const invitation = preview.data;
  return (
    <Card as="section" aria-labelledby="join-title" className="mx-auto max-w-xl space-y-5">
      <p className="font-bold text-vat-800">You are invited</p>
      <h1 id="join-title" className="font-display text-3xl font-semibold">
        Help run {invitation.studio.name} as {invitation.role}
      </h1>
      {invitation.studio.tagline ? <p className="text-lg">{invitation.studio.tagline}</p> : null}
      <Swatch hex={invitation.studio.accentHex} label="Studio color" />
      {invitation.status === 'waiting' ? (
        <JoinStep token={token} invitation={invitation} />
      ) : (
        <FormAlert>{spentWords[invitation.status]}</FormAlert>
      )}
    </Card>
  );
}

function JoinStep({ token, invitation }: { token: string; invitation: InvitationPreview }) {
  const { data: me, isPending } = useMe();
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const here = `/join/${token}`;

  if (isPending) return <LoadingBlock label="Checking who is here…" />;
  if (!me) {
    return (
      <div className="space-y-3">
        <p>
          The invitation is for <strong>{invitation.email}</strong>. Sign in with that address, or
          create an account for it; you come back here afterwards.
        </p>
        <div className="flex flex-wrap gap-3">
          <Link
            to={withNext('/sign-in', here, { email: invitation.email })}
            className={buttonClass()}
          >
            Sign in to accept
          </Link>
          <Link
            to={withNext('/sign-up', here, { email: invitation.email })}
            className={buttonClass('secondary')}
          >
            Create an account
          </Link>
        </div>
      </div>
    );
  }

  return (
    <div className="space-y-3">
      <p>
        Signed in as <strong>{me.profile.email}</strong>.
      </p>
      {accept.error ? <FormAlert>{accept.error.message}</FormAlert> : null}
      <Button
        size="hand"
        disabled={accept.isPending}
        onClick={() =>
          accept.mutate(undefined, {
            onSuccess: ({ studioSlug }) => navigate(`/studios/${studioSlug}/members`),
          })
        }
      >
        {accept.isPending ? 'Joining…' : `Accept and join ${invitation.studio.name}`}
      </Button>
    </div>
  );
}
