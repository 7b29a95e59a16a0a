import type { HostAction } from '@vatside/contracts/live';
import { isTimerDone, type PotTimer } from '@vatside/contracts/pot-timer';

export type TimerToggle = {
  type: Extract<HostAction['type'], 'timer:start' | 'timer:pause' | 'timer:resume'>;
  label: string;
};

/**
 * What the pot's one timer button (and Space) does now: start a ready timer, pause a running
 * one, resume a paused one, start a finished one again. Null when the step has no time to count.
 */
export function timerToggle(timer: PotTimer, nowMs: number): TimerToggle | null {
  switch (timer.state) {
    case 'idle':
      return timer.durationMs > 0 ? { type: 'timer:start', label: 'Start timer' } : null;
    case 'paused':
      return { type: 'timer:resume', label: 'Resume timer' };
    case 'running':
      return isTimerDone(timer, nowMs)
        ? { type: 'timer:start', label: 'Start again' }
        : { type: 'timer:pause', label: 'Pause timer' };
  }
}
