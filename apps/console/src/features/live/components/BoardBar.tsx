import type { LiveState } from '@vatside/contracts/live';
import { Link } from 'react-router-dom';
import type { Connection } from '../hooks/use-host-session.ts';

/** The strip above the pots: which session, how many phones follow, and the connection. */
export function BoardBar({
  title,
  mode,
  viewerCount,
  connection,
  leaveTo,
}: {
  title: string;
  mode: LiveState['mode'];
  viewerCount: number | undefined;
  connection: Connection;
  leaveTo: string;
}) {
  return (
    <header className="bg-vat-900 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
      <div className="flex flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
        <p className="flex items-center gap-3">
          <span className="font-display text-2xl font-semibold">Vatside</span>
          <span className="rounded-md border border-marigold-300 px-2 py-0.5 text-sm font-bold text-marigold-300">
            Pot board
          </span>
        </p>
        <h1 className="min-w-0 flex-1 truncate text-xl font-bold">{title}</h1>
        <p
          className={
            mode === 'live'
              ? 'rounded-full bg-madder-600 px-3 py-1 font-bold'
              : 'rounded-full bg-marigold-300 px-3 py-1 font-bold text-vat-950'
          }
        >
          {mode === 'live' ? '● Live' : 'Rehearsal'}
        </p>
        <p role="status" aria-label="Phones following" className="text-lg font-bold">
          {viewerCount ?? 0} {viewerCount === 1 ? 'phone' : 'phones'} following
        </p>
        <p className="font-bold">
          {connection === 'online'
            ? '✓ Connected'
            : connection === 'offline'
              ? '✕ Offline'
              : 'Connecting…'}
        </p>
        <Link
          to={leaveTo}
          className="inline-flex min-h-12 items-center rounded-lg px-3 font-bold underline underline-offset-4 hover:bg-vat-800"
        >
          Leave the board
        </Link>
      </div>
    </header>
  );
}
