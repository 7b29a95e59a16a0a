import { useQuery } from '@tanstack/react-query';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Link, Navigate, useParams } from 'react-router-dom';
import { studioLiveQueryOptions } from '../../features/live/live-now-api.ts';

/** /s/:slug/live: straight to the studio's running session, or a kind word when there is none. */
export function Component() {
  const { slug = '' } = useParams();
  const { data, error, isFetching, refetch } = useQuery(studioLiveQueryOptions(slug));
  if (data?.live) return <Navigate replace to={`/live/${data.live.sessionId}`} />;
  if (error) {
    return (
      <ErrorPanel
        title="We could not check the stove"
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
        retrySize="hand"
      />
    );
  }
  if (!data) return <LoadingBlock label="Looking at the stove…" />;
  return (
    <div className="space-y-4">
      <h1 className="font-display text-4xl font-semibold">Nothing on the stove right now</h1>
      <p className="text-xl">
        This studio is not dyeing live at the moment. Keep this page open: it moves you to the pots
        as soon as the host starts.
      </p>
      <Link to={`/s/${slug}`} className={textLinkClass}>
        See the studio’s page
      </Link>
    </div>
  );
}
