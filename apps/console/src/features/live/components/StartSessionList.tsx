import type { DyeAlong } from '@vatside/contracts/dye-alongs';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { useId } from 'react';
import { useNavigate } from 'react-router-dom';
import { useStartSession, type StartMode } from '../api.ts';

const statusWords: Record<string, string> = {
  draft: 'Draft: rehearse only',
  announced: 'Announced',
  live: 'Live',
};

/** Each dye-along that can start, with its two ways in: live, or a private rehearsal. */
export function StartSessionList({
  slug,
  dyeAlongs,
  boardPath,
}: {
  slug: string;
  dyeAlongs: DyeAlong[];
  boardPath: (sessionId: string) => string;
}) {
  if (dyeAlongs.length === 0) {
    return (
      <p className="text-lg">
        No dye-along is ready to run. Plan one with its colorways and run sheets, and announce it;
        you can rehearse a draft at any time.
      </p>
    );
  }
  return (
    <ul className="space-y-4">
      {dyeAlongs.map((dyeAlong) => (
        <li key={dyeAlong.id}>
          <StartCard slug={slug} dyeAlong={dyeAlong} boardPath={boardPath} />
        </li>
      ))}
    </ul>
  );
}

function StartCard({
  slug,
  dyeAlong,
  boardPath,
}: {
  slug: string;
  dyeAlong: DyeAlong;
  boardPath: (sessionId: string) => string;
}) {
  const titleId = useId();
  const start = useStartSession(slug);
  const navigate = useNavigate();
  const liveWhy = dyeAlong.nextStatuses.find((s) => s.to === 'live' && !s.allowed)?.reasons;
  const canGoLive = dyeAlong.status !== 'draft';

  function begin(mode: StartMode) {
    start.mutate(
      { dyeAlongId: dyeAlong.id, mode },
      { onSuccess: ({ sessionId }) => void navigate(boardPath(sessionId)) },
    );
  }

  return (
    <Card as="article" aria-labelledby={titleId} className="space-y-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={titleId} className="font-display text-2xl font-semibold">
          {dyeAlong.title}
        </h3>
        <span className="rounded-full border-2 border-vat-800 px-3 py-0.5 font-bold">
          {statusWords[dyeAlong.status] ?? dyeAlong.status}
        </span>
      </div>
      <p>
        {dyeAlong.startsAtHost.label} · {dyeAlong.colorways.length}{' '}
        {dyeAlong.colorways.length === 1 ? 'pot' : 'pots'}
        {dyeAlong.colorways.length > 0
          ? `: ${dyeAlong.colorways.map((c) => c.name).join(', ')}`
          : ''}
      </p>
      {canGoLive && liveWhy?.length ? <p className="text-vat-800">{liveWhy.join(' ')}</p> : null}
      {start.error ? (
        <p
          role="alert"
          className="rounded-xl border-2 border-madder-700 bg-madder-100 px-3 py-2 font-bold text-madder-800"
        >
          {start.error.message}
        </p>
      ) : null}
      <div className="grid gap-2 sm:grid-cols-2">
        {canGoLive ? (
          <Button size="hand" disabled={start.isPending} onClick={() => begin('live')}>
            Go live
          </Button>
        ) : null}
        <Button
          size="hand"
          variant="secondary"
          disabled={start.isPending}
          onClick={() => begin('rehearsal')}
        >
          Rehearse privately
        </Button>
      </div>
    </Card>
  );
}
