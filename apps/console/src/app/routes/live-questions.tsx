import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link, useParams } from 'react-router-dom';
import { StaffQuestions } from '../../features/live/components/StaffQuestions.tsx';
import { useHostSocket } from '../../features/live/hooks/use-host-socket.ts';
import { studioQueryOptions } from '../../features/studios/api.ts';

/** The question queue on its own page, for moderators who do not run the pot board. */
export function Component() {
  const { slug = '', sessionId = '' } = useParams();
  return (
    <RequireSignIn>
      <StaffGate slug={slug} sessionId={sessionId} />
    </RequireSignIn>
  );
}

function StaffGate({ slug, sessionId }: { slug: string; sessionId: string }) {
  const studio = useQuery(studioQueryOptions(slug));
  if (studio.isPending) return <LoadingBlock label="Opening the studio…" />;
  if (studio.isError) {
    return (
      <main className="mx-auto max-w-2xl p-6">
        <ErrorPanel
          title="This studio could not be opened"
          error={studio.error}
          onRetry={() => void studio.refetch()}
          retrying={studio.isFetching}
        />
      </main>
    );
  }
  const staff = studio.data.myRole === 'host' || studio.data.myRole === 'moderator';
  return (
    <main id="main" className="mx-auto max-w-2xl space-y-4 p-4">
      <h1 className="font-display text-3xl font-semibold">Questions · {studio.data.name}</h1>
      {staff ? (
        <Queue sessionId={sessionId} />
      ) : (
        <p className="text-lg">Only the studio’s host and moderators see the question queue.</p>
      )}
      <Link to="/" className={textLinkClass}>
        Back to the studio desk
      </Link>
    </main>
  );
}

function Queue({ sessionId }: { sessionId: string }) {
  const socket = useHostSocket();
  return (
    <Card as="section" aria-label="Question queue">
      <StaffQuestions socket={socket} sessionId={sessionId} />
    </Card>
  );
}
