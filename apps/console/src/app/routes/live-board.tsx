import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { useMe } from '@vatside/ui/session.ts';
import { Link, useParams } from 'react-router-dom';
import { LiveBoard } from '../../features/live/components/LiveBoard.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

/**
 * The pot board, full width and without the console's header: during the hour every pixel
 * goes to the pots. Host only here; the server checks every action again.
 */
export function Component() {
  const { slug = '', sessionId = '' } = useParams();
  return (
    <RequireSignIn>
      <HostGate slug={slug} sessionId={sessionId} />
    </RequireSignIn>
  );
}

function HostGate({ slug, sessionId }: { slug: string; sessionId: string }) {
  const { data: me } = useMe();
  const studio = useQuery(studioQueryOptions(slug));
  const stovetop = `/studios/${slug}/live`;
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
  if (studio.data.myRole !== 'host') {
    return (
      <main className="mx-auto max-w-2xl space-y-4 p-6">
        <h1 className="font-display text-3xl font-semibold">{studio.data.name}</h1>
        <p className="text-lg">Only the studio’s host drives the pots.</p>
        <Link to="/" className={textLinkClass}>
          Back to the studio desk
        </Link>
      </main>
    );
  }
  return (
    <LiveBoard
      key={sessionId}
      sessionId={sessionId}
      system={me?.profile.unitSystem ?? 'us'}
      leaveTo={stovetop}
    />
  );
}
