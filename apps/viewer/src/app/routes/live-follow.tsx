import { useQuery } from '@tanstack/react-query';
import { ApiError } from '@vatside/ui/api-client.ts';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Link, useParams } from 'react-router-dom';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { liveProgramQueryOptions } from '../../features/live/api.ts';
import { LiveFollowScreen } from '../../features/live/components/LiveFollowScreen.tsx';

/** /live/:sessionId, the follow-along. Its own full-width frame: the pots need the room. */
export function Component() {
  const { sessionId = '' } = useParams();
  const {
    data: program,
    error,
    isFetching,
    refetch,
  } = useQuery(liveProgramQueryOptions(sessionId));
  if (program) return <LiveFollowScreen key={program.sessionId} program={program} />;
  return (
    <main id="main" className="mx-auto max-w-xl space-y-4 p-4">
      {error ? (
        <>
          <ErrorPanel
            title={
              error instanceof ApiError && error.status === 404
                ? 'No dye-along at this address'
                : 'The run sheets did not load'
            }
            error={error}
            onRetry={() => void refetch()}
            retrying={isFetching}
            retrySize="hand"
          />
          <Link to="/" className={textLinkClass}>
            Back to the studios
          </Link>
        </>
      ) : (
        <LoadingBlock label="Setting out the pots…" />
      )}
    </main>
  );
}
