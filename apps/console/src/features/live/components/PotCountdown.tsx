import {
  formatCountdown,
  isTimerDone,
  remainingMs,
  type PotTimer,
} from '@vatside/contracts/pot-timer';
import { cx } from '@vatside/ui/cx.ts';

const stateWords = (timer: PotTimer, nowMs: number): string => {
  if (isTimerDone(timer, nowMs)) return 'Time’s up';
  switch (timer.state) {
    case 'idle':
      return timer.durationMs > 0 ? 'Ready' : 'No timer on this step';
    case 'paused':
      return 'Paused';
    case 'running':
      return 'Counting down';
  }
};

/** The pot's countdown, read at arm's length; `nowMs` is the server's time, not this laptop's. */
export function PotCountdown({ timer, nowMs }: { timer: PotTimer; nowMs: number }) {
  const done = isTimerDone(timer, nowMs);
  const none = timer.state === 'idle' && timer.durationMs === 0;
  return (
    <div
      className={cx(
        'flex items-baseline justify-between gap-3 rounded-xl border-2 px-4 py-2',
        done ? 'border-madder-700 bg-madder-100' : 'border-vat-800 bg-white',
      )}
    >
      <span
        data-testid="countdown"
        className={cx(
          'font-sans text-6xl leading-none font-bold tabular-nums',
          none ? 'text-vat-600' : done ? 'text-madder-800' : 'text-vat-950',
        )}
      >
        {formatCountdown(remainingMs(timer, nowMs))}
      </span>
      <span className={cx('text-right text-lg font-bold', done && 'text-madder-800')}>
        {done ? <span aria-hidden="true">⏰ </span> : null}
        {stateWords(timer, nowMs)}
      </span>
    </div>
  );
}
