import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { PrepChecklistView } from '@vatside/ui/supplies/PrepChecklistView';
import { SupplyListView } from '@vatside/ui/supplies/SupplyListView';
import type { ReactNode } from 'react';
import { publicDyeAlongQueryOptions } from '../api.ts';
import { useReader } from '../hooks/use-reader.ts';
import { InspirationPalette } from './Palette.tsx';
import { SkeinChoices } from './SkeinChoices.tsx';
import { StartTime } from './StartTime.tsx';

const statusWords = {
  draft: 'Not announced yet',
  announced: null,
  live: 'On the stove now',
  sharing: 'Done: now sharing skeins',
  recap: 'Done: recap time',
  archived: 'From the archive',
} as const;

/**
 * A dye-along as its viewers read it: when, what it looks like, what to get and do. `sharing`
 * puts another feature's word on sharing skeins right under the start time, on the reader's clock.
 */
export function DyeAlongPage({
  slug,
  dyeAlongId,
  sharing,
}: {
  slug: string;
  dyeAlongId: string;
  sharing?: (dyeAlong: PublicDyeAlong, timeZone: string) => ReactNode;
}) {
  const { reader, ready, signedIn, change, saveError } = useReader();
  const page = useQuery({
    ...publicDyeAlongQueryOptions(slug, dyeAlongId, reader),
    enabled: ready,
    // A new skein weight keeps the page in place while the amounts are worked out again.
    placeholderData: keepPreviousData,
  });

  if (page.isPending) return <LoadingBlock label="Opening the dye-along…" />;
  if (page.isError) {
    return (
      <ErrorPanel
        title={
          page.error instanceof ApiError && page.error.status === 404
            ? 'No dye-along at this address'
            : 'The dye-along did not load'
        }
        error={page.error}
        onRetry={() => void page.refetch()}
        retrying={page.isFetching}
        retrySize="hand"
      />
    );
  }
  const dyeAlong = page.data;
  const status = statusWords[dyeAlong.status];
  return (
    <article aria-labelledby="dye-along-title" className="space-y-6">
      <header className="space-y-1">
        <p className="font-bold text-vat-800">{dyeAlong.studio.name} · dye-along</p>
        <h1 id="dye-along-title" className="font-display text-4xl leading-tight font-semibold">
          {dyeAlong.title}
        </h1>
        {status ? <p className="text-lg font-bold">{status}</p> : null}
      </header>
      <StartTime dyeAlong={dyeAlong} timeZone={reader.timeZone} />
      {sharing?.(dyeAlong, reader.timeZone)}
      <nav aria-label="On this page" className="flex flex-wrap gap-x-6">
        <a href="#supplies-title" className={textLinkClass}>
          What to get
        </a>
        <a href="#prep-title" className={textLinkClass}>
          Getting ready
        </a>
      </nav>
      {dyeAlong.inspiration ? <InspirationPalette inspiration={dyeAlong.inspiration} /> : null}
      {dyeAlong.description ? (
        <p className="text-lg whitespace-pre-line">{dyeAlong.description}</p>
      ) : null}
      <SkeinChoices
        weightOfGoodsG={reader.weightOfGoodsG}
        system={reader.system}
        signedIn={signedIn}
        saveError={saveError}
        onChange={change}
      />
      <Card
        as="section"
        aria-labelledby="supplies-title"
        aria-busy={page.isPlaceholderData}
        className="space-y-4"
      >
        <h2 id="supplies-title" className="font-display text-2xl font-semibold">
          What to get
        </h2>
        <p className="text-vat-800">
          For one {dyeAlong.supplyList.weightOfGoodsG} g skein of each colorway
          {page.isPlaceholderData ? ' (working out your amounts…)' : ''}.
        </p>
        <SupplyListView supplies={dyeAlong.supplyList} />
      </Card>
      <Card as="section" aria-labelledby="prep-title" className="space-y-4">
        <h2 id="prep-title" className="font-display text-2xl font-semibold">
          Getting ready
        </h2>
        <PrepChecklistView checklist={dyeAlong.prepChecklist} />
      </Card>
    </article>
  );
}
