import { useQuery } from '@tanstack/react-query';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { storageQueryOptions } from '../api.ts';
import { formatBytes } from '../format.ts';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The studio's storage: workbench images, shared skein photos, and who shares the most. */
export function StoragePanel({ slug }: { slug: string }) {
  const { data, error, isPending, isFetching, refetch } = useQuery(storageQueryOptions(slug));
  return (
    <Card as="section" aria-labelledby="storage-title" className="space-y-4">
      <h2 id="storage-title" className="font-display text-2xl font-semibold">
        Storage
      </h2>
      {isPending ? (
        <LoadingBlock label="Adding up the photos…" />
      ) : error ? (
        <ErrorPanel
          title="Storage use could not be loaded"
          error={error}
          onRetry={() => void refetch()}
          retrying={isFetching}
        />
      ) : (
        <>
          <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1">
            <dt>Workbench images ({plural(data.workbenchImages.images, 'image', 'images')})</dt>
            <dd className="text-right font-bold">{formatBytes(data.workbenchImages.bytes)}</dd>
            <dt>
              Shared skein photos ({plural(data.skeinPhotos.photos, 'photo', 'photos')} of{' '}
              {plural(data.skeinPhotos.skeins, 'skein', 'skeins')})
            </dt>
            <dd className="text-right font-bold">{formatBytes(data.skeinPhotos.bytes)}</dd>
            <dt className="border-t border-wool-200 pt-1 font-bold">In all</dt>
            <dd className="border-t border-wool-200 pt-1 text-right font-bold">
              {formatBytes(data.totalBytes)}
            </dd>
          </dl>
          <p className="text-sm text-vat-800">
            Each member may keep {formatBytes(data.limits.storageQuotaBytes)} of skein photos here
            and share {plural(data.limits.sharesPerHour, 'skein', 'skeins')} an hour. Sizes are the
            stored photos; small previews are not counted.
          </p>
          {data.topSharers.length > 0 ? (
            <section aria-labelledby="top-sharers-title" className="space-y-2">
              <h3 id="top-sharers-title" className="font-bold">
                Most room taken by
              </h3>
              <ol className="divide-y divide-wool-200">
                {data.topSharers.map((sharer) => (
                  <li
                    key={sharer.userId}
                    className="flex items-baseline justify-between gap-4 py-1"
                  >
                    <span>
                      <span className="font-bold">{sharer.name}</span>{' '}
                      <span className="text-sm text-vat-800">
                        {plural(sharer.skeins, 'skein', 'skeins')},{' '}
                        {plural(sharer.photos, 'photo', 'photos')}
                      </span>
                    </span>
                    <span className="font-bold">{formatBytes(sharer.bytes)}</span>
                  </li>
                ))}
              </ol>
            </section>
          ) : (
            <p>No skein photos shared yet.</p>
          )}
        </>
      )}
    </Card>
  );
}
