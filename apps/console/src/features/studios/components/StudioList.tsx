import { useQuery } from '@tanstack/react-query';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Swatch } from '@vatside/ui/Swatch';
import { studiosQueryOptions } from '../api.ts';

export function StudioList() {
  const { data, error, isPending, isFetching, failureCount, refetch } =
    useQuery(studiosQueryOptions());

  if (isPending) {
    return (
      <LoadingBlock
        label={failureCount > 0 ? 'Still trying to reach the studios…' : 'Gathering studios…'}
      />
    );
  }
  if (error) {
    return (
      <ErrorPanel
        title="Studios could not be loaded"
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
      />
    );
  }
  if (data.studios.length === 0) {
    return <p className="text-lg">No studios yet. A studio appears here once it is created.</p>;
  }

  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {data.studios.map((studio) => (
        <Card as="li" key={studio.id} className="flex flex-col gap-3">
          <div>
            <h3 className="font-display text-2xl font-semibold">{studio.name}</h3>
            <p className="text-vat-800">{studio.tagline}</p>
          </div>
          <div className="border-t border-wool-200 pt-3">
            <Swatch hex={studio.accentHex} label="Studio accent" showHex />
          </div>
        </Card>
      ))}
    </ul>
  );
}
