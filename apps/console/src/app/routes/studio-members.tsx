import { useQuery } from '@tanstack/react-query';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useParams } from 'react-router-dom';
import { InvitationsPanel } from '../../features/invitations/components/InvitationsPanel.tsx';
import { membersQueryOptions } from '../../features/members/api.ts';
import { MembersTable } from '../../features/members/components/MembersTable.tsx';
import { StoragePanel } from '../../features/storage/components/StoragePanel.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

/** Members, invitations and storage of the current studio; hosts change, moderators look. */
export function Component() {
  const { slug = '' } = useParams();
  const { data: studio } = useQuery(studioQueryOptions(slug));
  const members = useQuery(membersQueryOptions(slug));
  const isHost = studio?.myRole === 'host';

  return (
    <div className="grid items-start gap-8 2xl:grid-cols-[1fr_24rem]">
      <section aria-labelledby="members-title" className="min-w-0 space-y-4">
        <div>
          <h2 id="members-title" className="font-display text-2xl font-semibold">
            Members
          </h2>
          <p className="text-vat-800">
            {isHost
              ? 'Change a role or remove someone in their row. A studio always keeps a host.'
              : 'Only hosts change roles; ask one if something here needs to change.'}
          </p>
        </div>
        {members.isPending ? (
          <LoadingBlock label="Gathering members…" />
        ) : members.error ? (
          <ErrorPanel
            title="Members could not be loaded"
            error={members.error}
            onRetry={() => void members.refetch()}
            retrying={members.isFetching}
          />
        ) : (
          <MembersTable slug={slug} members={members.data.members} canManage={isHost} />
        )}
      </section>
      {isHost ? (
        <div className="space-y-8">
          <InvitationsPanel slug={slug} />
          <StoragePanel slug={slug} />
        </div>
      ) : null}
    </div>
  );
}
