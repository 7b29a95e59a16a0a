import { formatCountdown, remainingMs, type PotTimer } from '@vatside/contracts/pot-timer';
import { cx } from '@vatside/ui/cx.ts';

const stateWords = {
  idle: 'Not started',
  running: 'Counting down',
  paused: 'Paused',
} as const;

/**
 * A pot's countdown, big enough to read from the stove. `nowMs` is on the same clock as the
 * timer: the server's for the host's pots, this phone's for own-pace pots.
 */
export function PotCountdown({
  colorwayName,
  timer,
  nowMs,
}: {
  colorwayName: string;
  timer: PotTimer;
  nowMs: number;
}) {
  if (timer.durationMs <= 0) {
    return <p className="text-lg font-bold text-vat-800">No timer on this step</p>;
  }
  const leftMs = remainingMs(timer, nowMs);
  const done = timer.state === 'running' && leftMs <= 0;
  const shown = formatCountdown(leftMs);
  return (
    <div
      role="timer"
      aria-label={`${colorwayName} timer`}
      className={cx(
        'flex flex-wrap items-baseline justify-between gap-x-4 rounded-xl border-2 px-4 py-2',
        done ? 'border-marigold-500 bg-marigold-100' : 'border-vat-800 bg-white',
      )}
    >
      {/* As large as a phone's width allows, to be read from the stove; hours need more room. */}
      <span
        className={cx(
          'font-display leading-none font-semibold tabular-nums',
          shown.length > 5 ? 'text-6xl' : 'text-8xl',
        )}
      >
        {shown}
      </span>
      <span className="text-xl font-bold">{done ? 'Time’s up' : stateWords[timer.state]}</span>
    </div>
  );
}
