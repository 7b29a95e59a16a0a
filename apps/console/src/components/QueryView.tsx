import type { UseQueryResult } from '@tanstack/react-query';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import type { ReactNode } from 'react';

/** Loading, failure with a retry, or the data: the three states every list and detail has. */
export function QueryView<T>({
  query,
  loading,
  failed,
  children,
}: {
  query: UseQueryResult<T>;
  loading: string;
  failed: string;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <LoadingBlock label={loading} />;
  if (query.isError) {
    return (
      <ErrorPanel
        title={failed}
        error={query.error}
        onRetry={() => void query.refetch()}
        retrying={query.isFetching}
      />
    );
  }
  return <>{children(query.data)}</>;
}
