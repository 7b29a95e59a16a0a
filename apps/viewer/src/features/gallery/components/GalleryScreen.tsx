import { useInfiniteQuery } from '@tanstack/react-query';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useEffect, useRef } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { galleryPagePath, galleryQueryOptions } from '../api.ts';
import { ColorwayFilter } from './ColorwayFilter.tsx';
import { SkeinThumb } from './SkeinThumb.tsx';
import { StudioStrip } from './StudioStrip.tsx';

/** The month's gallery: the studio's own colorways, then the community's skeins in a grid. */
export function GalleryScreen({ slug, dyeAlongId }: { slug: string; dyeAlongId: string }) {
  const [params, setParams] = useSearchParams();
  const colorwayId = params.get('colorway');
  const gallery = useInfiniteQuery(galleryQueryOptions(slug, dyeAlongId, colorwayId));
  const choose = (id: string | null) =>
    setParams(id ? { colorway: id } : {}, { replace: true, preventScrollReset: true });
  const home = `/s/${slug}/dye-alongs/${dyeAlongId}`;
  const back = (
    <Link to={home} className={`${textLinkClass} gap-1`}>
      <span aria-hidden="true">←</span>The dye-along
    </Link>
  );

  if (gallery.isPending) return <LoadingBlock label="Gathering the skeins…" />;
  // A failed next page keeps the pages already shown; only a first failure replaces them.
  if (!gallery.data) {
    return (
      <div className="space-y-4">
        {back}
        <ErrorPanel
          title={
            gallery.error instanceof ApiError && gallery.error.status === 404
              ? 'No gallery at this address'
              : 'The gallery did not load'
          }
          error={gallery.error}
          onRetry={() => void gallery.refetch()}
          retrying={gallery.isFetching}
          retrySize="hand"
        />
      </div>
    );
  }
  const [first] = gallery.data.pages;
  const colorways = first?.colorways ?? [];
  const skeins = gallery.data.pages.flatMap((p) => p.items);
  const total = first?.page.total ?? 0;
  const filterName = colorways.find((c) => c.id === colorwayId)?.name;
  return (
    <article aria-labelledby="gallery-title" className="space-y-6">
      {back}
      <h1 id="gallery-title" className="font-display text-4xl leading-tight font-semibold">
        The month’s skeins
      </h1>
      <StudioStrip colorways={colorways} />
      <section aria-labelledby="community-title" className="space-y-4">
        <h2 id="community-title" className="font-display text-2xl font-semibold">
          From the community
        </h2>
        <ColorwayFilter colorways={colorways} chosen={colorwayId} onChoose={choose} />
        <p aria-live="polite" className="text-vat-800">
          {total === 0
            ? filterName
              ? `No skeins of ${filterName} shared yet.`
              : 'No skeins shared yet. They appear here once the studio has looked at them.'
            : `Showing ${skeins.length} of ${total} ${total === 1 ? 'skein' : 'skeins'}${filterName ? ` of ${filterName}` : ''}.`}
        </p>
        <ul aria-label="Shared skeins" className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {skeins.map((skein) => (
            <li key={skein.id}>
              <SkeinThumb skein={skein} to={`${galleryPagePath(slug, dyeAlongId)}/${skein.id}`} />
            </li>
          ))}
        </ul>
        {gallery.hasNextPage ? (
          <MoreSkeins
            loading={gallery.isFetchingNextPage}
            onMore={() => void gallery.fetchNextPage()}
          />
        ) : null}
        {gallery.isFetchNextPageError ? (
          <p role="alert" className="font-bold text-madder-700">
            More skeins did not load: {gallery.error.message}
          </p>
        ) : null}
      </section>
    </article>
  );
}

/** A button (always there, for keyboards and slow phones) that also presses itself on scroll. */
function MoreSkeins({ loading, onMore }: { loading: boolean; onMore: () => void }) {
  const ref = useRef<HTMLButtonElement>(null);
  const latest = useRef(onMore);
  useEffect(() => {
    latest.current = loading ? () => undefined : onMore;
  });
  useEffect(() => {
    const node = ref.current;
    if (!node || typeof IntersectionObserver === 'undefined') return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) latest.current();
      },
      { rootMargin: '400px' },
    );
    observer.observe(node);
    return () => observer.disconnect();
  }, []);
  return (
    <Button ref={ref} size="hand" variant="secondary" disabled={loading} onClick={onMore}>
      {loading ? 'Loading more skeins…' : 'Show more skeins'}
    </Button>
  );
}
