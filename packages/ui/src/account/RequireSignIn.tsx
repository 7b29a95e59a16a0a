import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { ErrorPanel } from '../ErrorPanel.tsx';
import { LoadingBlock } from '../LoadingBlock.tsx';
import { useMe } from '../session.ts';
import { withNext } from './next-path.ts';

/** Sends a visitor to sign in, then back here. The server checks again on every request. */
export function RequireSignIn({ children }: { children: ReactNode }) {
  const { data: me, error, isPending, isFetching, refetch } = useMe();
  const location = useLocation();
  if (isPending) return <LoadingBlock label="Checking who is here…" />;
  if (error) {
    return (
      <ErrorPanel
        title="We could not tell who is signed in"
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
      />
    );
  }
  if (!me) {
    return <Navigate to={withNext('/sign-in', location.pathname + location.search)} replace />;
  }
  return children;
}
