import { z } from 'zod';

/**
 * A pot's timer as the server stores and sends it: absolute server times, never "seconds left",
 * so a phone that reconnects, or whose clock is off, still counts down to the same moment.
 */
export const potTimerSchema = z.discriminatedUnion('state', [
  z.object({ state: z.literal('idle'), durationMs: z.number().int().nonnegative() }),
  z.object({
    state: z.literal('running'),
    durationMs: z.number().int().nonnegative(),
    startedAtMs: z.number(),
    endsAtMs: z.number(),
  }),
  z.object({
    state: z.literal('paused'),
    durationMs: z.number().int().nonnegative(),
    remainingMs: z.number().nonnegative(),
  }),
]);
export type PotTimer = z.infer<typeof potTimerSchema>;

export class TimerTransitionError extends Error {
  constructor(
    readonly from: PotTimer['state'],
    readonly action: string,
  ) {
    super(`A ${from} timer cannot ${action}.`);
  }
}

export const idleTimer = (durationMs: number): PotTimer => ({ state: 'idle', durationMs });

export function startTimer(timer: PotTimer, nowMs: number): PotTimer {
  return {
    state: 'running',
    durationMs: timer.durationMs,
    startedAtMs: nowMs,
    endsAtMs: nowMs + timer.durationMs,
  };
}

export function pauseTimer(timer: PotTimer, nowMs: number): PotTimer {
  if (timer.state !== 'running') throw new TimerTransitionError(timer.state, 'pause');
  return {
    state: 'paused',
    durationMs: timer.durationMs,
    remainingMs: Math.max(0, timer.endsAtMs - nowMs),
  };
}

export function resumeTimer(timer: PotTimer, nowMs: number): PotTimer {
  if (timer.state !== 'paused') throw new TimerTransitionError(timer.state, 'resume');
  return {
    state: 'running',
    durationMs: timer.durationMs,
    startedAtMs: nowMs,
    endsAtMs: nowMs + timer.remainingMs,
  };
}

/** Adds time: to a finished timer it starts counting again from now. */
export function extendTimer(timer: PotTimer, byMs: number, nowMs: number): PotTimer {
  if (!(byMs > 0)) throw new RangeError('Extend by a positive amount of time.');
  const durationMs = timer.durationMs + byMs;
  switch (timer.state) {
    case 'idle':
      return { state: 'idle', durationMs };
    case 'paused':
      return { state: 'paused', durationMs, remainingMs: timer.remainingMs + byMs };
    case 'running':
      return { ...timer, durationMs, endsAtMs: Math.max(timer.endsAtMs, nowMs) + byMs };
  }
}

export function remainingMs(timer: PotTimer, nowMs: number): number {
  switch (timer.state) {
    case 'idle':
      return timer.durationMs;
    case 'paused':
      return timer.remainingMs;
    case 'running':
      return Math.max(0, timer.endsAtMs - nowMs);
  }
}

export const isTimerDone = (timer: PotTimer, nowMs: number) =>
  timer.state === 'running' && nowMs >= timer.endsAtMs;

/**
 * What a viewer should see when the video reaches them `delayMs` late: the same timer, shifted
 * so it ends when the host's pot ends *on their screen*.
 */
export function delayedTimer(timer: PotTimer, delayMs: number): PotTimer {
  if (timer.state !== 'running' || delayMs <= 0) return timer;
  return { ...timer, startedAtMs: timer.startedAtMs + delayMs, endsAtMs: timer.endsAtMs + delayMs };
}

/** mm:ss (or h:mm:ss) for a countdown, rounding up so "0:00" shows only when time is up. */
export function formatCountdown(ms: number): string {
  const total = Math.ceil(Math.max(0, ms) / 1000);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  const ss = String(s).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}
