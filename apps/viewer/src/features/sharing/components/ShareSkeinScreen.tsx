import { useQuery } from '@tanstack/react-query';
import type { Submission } from '@vatside/contracts/submissions';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button, buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { sharingDyeAlongQueryOptions } from '../api.ts';
import { shareWindowOf } from '../window.ts';
import { ClosenessResult } from './ClosenessResult.tsx';
import { ShareForm } from './ShareForm.tsx';

/** "Share your skein" for one dye-along: the form while sharing is open, then the result. */
export function ShareSkeinScreen({ slug, dyeAlongId }: { slug: string; dyeAlongId: string }) {
  const page = useQuery(sharingDyeAlongQueryOptions(slug, dyeAlongId));
  const [shared, setShared] = useState<Submission | null>(null);
  // A new form for the next skein: nothing carries over from the last one.
  const [round, setRound] = useState(0);

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
  const sharing = shareWindowOf(dyeAlong);
  const back = `/s/${slug}/dye-alongs/${dyeAlongId}`;
  const mySkeins = `/s/${slug}/my-skeins`;

  return (
    <article aria-labelledby="share-title" className="space-y-6">
      <header className="space-y-1">
        <p className="font-bold text-vat-800">
          <Link to={back} className={textLinkClass}>
            {dyeAlong.title}
          </Link>
        </p>
        <h1 id="share-title" className="font-display text-4xl leading-tight font-semibold">
          Share your skein
        </h1>
        <p className="text-lg">{sharing.words}</p>
      </header>
      {shared ? (
        <Card as="section" aria-label="Shared" className="space-y-5">
          <p role="status" className="text-xl font-bold">
            Shared. A moderator will look at it soon.
          </p>
          <ClosenessResult skein={shared} />
          <div className="grid gap-3">
            <Link to={mySkeins} className={buttonClass('primary', 'hand')}>
              See My skeins
            </Link>
            <Button
              variant="secondary"
              size="hand"
              onClick={() => {
                setShared(null);
                setRound(round + 1);
              }}
            >
              Share another skein
            </Button>
          </div>
        </Card>
      ) : sharing.open ? (
        <ShareForm
          key={round}
          slug={slug}
          dyeAlongId={dyeAlongId}
          colorways={dyeAlong.supplyList.colorways.map((c) => ({
            colorwayId: c.colorwayId,
            name: c.name,
          }))}
          onShared={(skein) => {
            setShared(skein);
            window.scrollTo({ top: 0 });
          }}
        />
      ) : (
        <Link to={mySkeins} className={buttonClass('secondary', 'hand')}>
          See My skeins
        </Link>
      )}
    </article>
  );
}
