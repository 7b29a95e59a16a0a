import { useQuery } from '@tanstack/react-query';
import type { Invitation, InvitationStatus } from '@vatside/contracts/members';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { invitationsQueryOptions, useRevokeInvitation } from '../api.ts';
import { InviteForm } from './InviteForm.tsx';

const statusWords: Record<InvitationStatus, string> = {
  waiting: 'Waiting for a reply',
  accepted: 'Joined',
  revoked: 'Withdrawn',
  expired: 'Ran out',
};
const sentFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium' });

/** Hosts invite moderators by e-mail and see what became of each invitation. */
export function InvitationsPanel({ slug }: { slug: string }) {
  const { data, error, isPending, isFetching, refetch } = useQuery(invitationsQueryOptions(slug));
  const revoke = useRevokeInvitation(slug);

  return (
    <Card as="section" aria-labelledby="invitations-title" className="space-y-5">
      <h2 id="invitations-title" className="font-display text-2xl font-semibold">
        Invite a moderator
      </h2>
      <InviteForm slug={slug} />
      <h3 className="border-t border-wool-200 pt-4 text-lg font-bold">Invitations sent</h3>
      {revoke.error ? <FormAlert>{revoke.error.message}</FormAlert> : null}
      {isPending ? (
        <LoadingBlock label="Gathering invitations…" />
      ) : error ? (
        <ErrorPanel
          title="Invitations could not be loaded"
          error={error}
          onRetry={() => void refetch()}
          retrying={isFetching}
        />
      ) : data.invitations.length === 0 ? (
        <p>None yet.</p>
      ) : (
        <ul aria-label="Invitations sent" className="divide-y divide-wool-200">
          {data.invitations.map((invitation) => (
            <InvitationRow
              key={invitation.id}
              invitation={invitation}
              revoking={revoke.isPending && revoke.variables === invitation.id}
              onRevoke={() => revoke.mutate(invitation.id)}
            />
          ))}
        </ul>
      )}
    </Card>
  );
}

function InvitationRow({
  invitation,
  revoking,
  onRevoke,
}: {
  invitation: Invitation;
  revoking: boolean;
  onRevoke: () => void;
}) {
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-3">
      <div className="min-w-0">
        <p className="font-bold break-all">{invitation.email}</p>
        <p className="text-sm text-vat-800">
          {statusWords[invitation.status]} · sent{' '}
          {sentFormat.format(new Date(invitation.createdAt))}
        </p>
      </div>
      {invitation.status === 'waiting' ? (
        <Button
          variant="secondary"
          aria-label={`Withdraw the invitation to ${invitation.email}`}
          onClick={onRevoke}
          disabled={revoking}
        >
          {revoking ? 'Withdrawing…' : 'Withdraw'}
        </Button>
      ) : null}
    </li>
  );
}
