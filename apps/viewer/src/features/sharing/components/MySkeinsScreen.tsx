import { useQuery } from '@tanstack/react-query';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { mySkeinsQueryOptions } from '../api.ts';
import { SkeinCard } from './SkeinCard.tsx';

/** Every skein I have shared in this studio, newest first. */
export function MySkeinsScreen({ slug, studioName }: { slug: string; studioName: string }) {
  const list = useQuery(mySkeinsQueryOptions(slug));
  return (
    <section aria-labelledby="my-skeins-title" className="space-y-6">
      <header className="space-y-1">
        <p className="font-bold text-vat-800">{studioName}</p>
        <h1 id="my-skeins-title" className="font-display text-4xl leading-tight font-semibold">
          My skeins
        </h1>
      </header>
      {list.isPending ? (
        <LoadingBlock label="Gathering your skeins…" />
      ) : list.isError ? (
        <ErrorPanel
          title="Your skeins did not load"
          error={list.error}
          onRetry={() => void list.refetch()}
          retrying={list.isFetching}
          retrySize="hand"
        />
      ) : list.data.items.length === 0 ? (
        <p className="text-lg">
          Nothing shared here yet. When a dye-along opens for sharing, its page has a “Share your
          skein” button.
        </p>
      ) : (
        <ul className="space-y-6">
          {list.data.items.map((skein) => (
            <SkeinCard key={skein.id} slug={slug} skein={skein} />
          ))}
        </ul>
      )}
    </section>
  );
}
