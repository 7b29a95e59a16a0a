import { useQuery } from '@tanstack/react-query';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Swatch } from '@vatside/ui/Swatch';
import { studiosQueryOptions } from '../api.ts';

export function StudioCards() {
  const { data, error, isPending, isFetching, failureCount, refetch } =
    useQuery(studiosQueryOptions());

  if (isPending) {
    return (
      <LoadingBlock
        label={failureCount > 0 ? 'Still trying to reach the studios…' : 'Finding studios…'}
      />
    );
  }
  if (error) {
    return (
      <ErrorPanel
        title="The studios did not load"
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
        retrySize="hand"
      />
    );
  }
  if (data.studios.length === 0) {
    return <p className="text-lg">No studios are open yet. Check back soon.</p>;
  }

  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {data.studios.map((studio) => (
        <Card as="li" key={studio.id} padded={false} className="overflow-hidden">
          <div aria-hidden="true" className="h-4" style={{ backgroundColor: studio.accentHex }} />
          <div className="space-y-3 p-5">
            <h3 className="font-display text-2xl font-semibold">{studio.name}</h3>
            <p className="text-lg">{studio.tagline}</p>
            <Swatch hex={studio.accentHex} label="Studio color" showHex />
          </div>
        </Card>
      ))}
    </ul>
  );
}
