import { useQuery } from '@tanstack/react-query';
import type { StudioDetail } from '@vatside/contracts/studios';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import type { ReactNode } from 'react';
import { studioQueryOptions } from '../../features/studios/api.ts';
import { FollowPanel } from '../../features/studios/components/FollowPanel.tsx';

/**
 * Sharing is for the studio's members: a visitor signs in first (and comes back here), someone
 * signed in but not following is offered the follow button. The server checks again.
 */
export function MemberGate({
  slug,
  why,
  children,
}: {
  slug: string;
  /** What following lets them do here, e.g. "share a skein". */
  why: string;
  children: (studio: StudioDetail) => ReactNode;
}) {
  return (
    <RequireSignIn>
      <FollowingOnly slug={slug} why={why}>
        {children}
      </FollowingOnly>
    </RequireSignIn>
  );
}

function FollowingOnly({
  slug,
  why,
  children,
}: {
  slug: string;
  why: string;
  children: (studio: StudioDetail) => ReactNode;
}) {
  const studio = useQuery(studioQueryOptions(slug));
  if (studio.isPending) return <LoadingBlock label="Opening the studio…" />;
  if (studio.isError) {
    return (
      <ErrorPanel
        title={
          studio.error instanceof ApiError && studio.error.status === 404
            ? 'No studio at this address'
            : 'The studio did not load'
        }
        error={studio.error}
        onRetry={() => void studio.refetch()}
        retrying={studio.isFetching}
        retrySize="hand"
      />
    );
  }
  if (studio.data.myRole === 'visitor') {
    return (
      <div className="space-y-4">
        <Card as="section" aria-label="Follow first" className="space-y-2">
          <h1 className="font-display text-3xl font-semibold">Follow {studio.data.name} first</h1>
          <p className="text-lg">Following lets you {why}. It is free and you can stop any time.</p>
        </Card>
        <FollowPanel studio={studio.data} />
      </div>
    );
  }
  return children(studio.data);
}
