import { useQuery } from '@tanstack/react-query';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Link } from 'react-router-dom';
import { galleryPagePath, gallerySkeinQueryOptions } from '../api.ts';
import { fiberWords } from './fiber.ts';

/** One shared skein at its own address: every photo, who made it, on what, with what. */
export function SkeinDetail({
  slug,
  dyeAlongId,
  skeinId,
}: {
  slug: string;
  dyeAlongId: string;
  skeinId: string;
}) {
  const skein = useQuery(gallerySkeinQueryOptions(slug, dyeAlongId, skeinId));
  const back = (
    <Link to={galleryPagePath(slug, dyeAlongId)} className={`${textLinkClass} gap-1`}>
      <span aria-hidden="true">←</span>All the month’s skeins
    </Link>
  );
  if (skein.isPending) return <LoadingBlock label="Opening the skein…" />;
  if (skein.isError) {
    return (
      <div className="space-y-4">
        {back}
        <ErrorPanel
          title={
            skein.error instanceof ApiError && skein.error.status === 404
              ? 'This skein is not in the gallery'
              : 'The skein did not load'
          }
          error={skein.error}
          onRetry={() => void skein.refetch()}
          retrying={skein.isFetching}
          retrySize="hand"
        />
      </div>
    );
  }
  const s = skein.data;
  const title = s.colorway?.name ?? 'Own colors';
  return (
    <article aria-labelledby="skein-title" className="space-y-5">
      {back}
      <header className="space-y-1">
        {s.featured ? <p className="font-bold text-vat-800">★ Featured by the studio</p> : null}
        <h1 id="skein-title" className="font-display text-4xl leading-tight font-semibold">
          {title}
        </h1>
        <p className="text-lg">
          Dyed by <span className="font-bold">{s.makerName}</span>
        </p>
      </header>
      <ul aria-label="Photos" className="space-y-3">
        {s.photos.map((photo, i) => (
          <li key={photo.id}>
            <img
              src={photo.webUrl}
              width={photo.width}
              height={photo.height}
              loading={i === 0 ? 'eager' : 'lazy'}
              decoding="async"
              alt={`Photo ${i + 1} of ${s.photos.length}: ${title} by ${s.makerName}`}
              className="h-auto w-full rounded-card border border-wool-200"
            />
          </li>
        ))}
      </ul>
      <Card as="section" aria-labelledby="skein-facts-title" className="space-y-3">
        <h2 id="skein-facts-title" className="font-display text-2xl font-semibold">
          How it was dyed
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-lg">
          <dt className="font-bold">Base</dt>
          <dd>{s.baseName || 'Not given'}</dd>
          <dt className="font-bold">Fiber</dt>
          <dd>{s.fiberContent.length ? fiberWords(s.fiberContent) : 'Not given'}</dd>
          <dt className="font-bold">Dyes</dt>
          <dd>{s.dyesUsed.length ? s.dyesUsed.join(', ') : 'Not given'}</dd>
        </dl>
        {s.notes ? <p className="text-lg whitespace-pre-line">{s.notes}</p> : null}
        {s.closeness ? <p className="text-vat-800">{s.closeness.message}</p> : null}
      </Card>
    </article>
  );
}
