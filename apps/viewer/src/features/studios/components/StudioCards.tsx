import { useQuery } from '@tanstack/react-query';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Swatch } from '@vatside/ui/Swatch';
import { Link } from 'react-router-dom';
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
        <Card
          as="li"
          key={studio.id}
          padded={false}
          className="relative overflow-hidden has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700"
        >
          <div aria-hidden="true" className="h-4" style={{ backgroundColor: studio.accentHex }} />
          <div className="space-y-3 p-5">
            <h3 className="font-display text-2xl font-semibold">
              {/* The whole card is the touch target; the link text stays the studio's name. */}
              <Link
                to={`/s/${studio.slug}`}
                className="underline-offset-4 outline-none after:absolute after:inset-0 hover:underline"
              >
                {studio.name}
              </Link>
            </h3>
            <p className="text-lg">{studio.tagline}</p>
            <Swatch hex={studio.accentHex} label="Studio color" showHex />
          </div>
        </Card>
      ))}
    </ul>
  );
}
