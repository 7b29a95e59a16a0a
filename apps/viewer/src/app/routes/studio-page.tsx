import { useQuery } from '@tanstack/react-query';
import { ApiError } from '@vatside/ui/api-client.ts';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useParams } from 'react-router-dom';
import { NextDyeAlongLink } from '../../features/dye-alongs/components/NextDyeAlongLink.tsx';
import { LiveNowLink } from '../../features/live/components/LiveNowLink.tsx';
import { MySkeinsLink } from '../../features/sharing/components/MySkeinsLink.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';
import { FollowPanel } from '../../features/studios/components/FollowPanel.tsx';
import { StudioProfile } from '../../features/studios/components/StudioProfile.tsx';

/** /s/:slug, a studio's public page. */
export function Component() {
  const { slug = '' } = useParams();
  const {
    data: studio,
    error,
    isPending,
    isFetching,
    refetch,
  } = useQuery(studioQueryOptions(slug));
  if (isPending) return <LoadingBlock label="Opening the studio…" />;
  if (error) {
    return (
      <ErrorPanel
        title={
          error instanceof ApiError && error.status === 404
            ? 'No studio at this address'
            : 'The studio did not load'
        }
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
        retrySize="hand"
      />
    );
  }
  return (
    <div className="space-y-6">
      <StudioProfile studio={studio} />
      <LiveNowLink slug={studio.slug} />
      <NextDyeAlongLink slug={studio.slug} />
      {studio.myRole !== 'visitor' ? <MySkeinsLink slug={studio.slug} /> : null}
      <FollowPanel studio={studio} />
    </div>
  );
}
