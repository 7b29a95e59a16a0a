import type { LivePot } from '@vatside/contracts/live';
import type { LiveProgramPot } from '@vatside/contracts/live-program';
import {
  extendTimer,
  idleTimer,
  pauseTimer,
  potTimerSchema,
  remainingMs,
  resumeTimer,
  startTimer,
  type PotTimer,
} from '@vatside/contracts/pot-timer';
import { z } from 'zod';

/** A pot the viewer runs at their own pace. Its timer is on this phone's own clock. */
export const ownPotSchema = z.object({
  stepIndex: z.number().int().nonnegative(),
  timer: potTimerSchema,
});
export type OwnPot = z.infer<typeof ownPotSchema>;

/** Own-pace pots of one session, by potId; pots not in it follow the host. */
export const ownPaceSchema = z.record(z.string(), ownPotSchema);
export type OwnPace = z.infer<typeof ownPaceSchema>;

export const ownPaceStorageKey = (sessionId: string) => `vatside.ownPace.${sessionId}`;

export type OwnPaceAction = 'next' | 'previous' | 'start' | 'pause' | 'resume' | 'addMinute';

const stepTimer = (pot: LiveProgramPot, stepIndex: number) =>
  idleTimer((pot.steps[stepIndex]?.timerSeconds ?? 0) * 1000);

/**
 * Where own pace starts: the host's step, and the host's timer carried over to this phone's
 * clock so the time left does not jump. Without the host's state, the first step.
 */
export function takeOver(
  program: LiveProgramPot,
  host: LivePot | undefined,
  serverNowMs: number,
  localNowMs: number,
): OwnPot {
  if (!host) return { stepIndex: 0, timer: stepTimer(program, 0) };
  const stepIndex = Math.min(host.stepIndex, Math.max(0, program.steps.length - 1));
  const timer: PotTimer =
    host.timer.state === 'running'
      ? {
          ...host.timer,
          startedAtMs: host.timer.startedAtMs - serverNowMs + localNowMs,
          endsAtMs: localNowMs + remainingMs(host.timer, serverNowMs),
        }
      : host.timer;
  return { stepIndex, timer };
}

/** One press of an own-pace control. Presses that make no sense leave the pot as it is. */
export function applyOwnPace(
  pot: OwnPot,
  action: OwnPaceAction,
  program: LiveProgramPot,
  nowMs: number,
): OwnPot {
  switch (action) {
    case 'next':
    case 'previous': {
      const stepIndex = pot.stepIndex + (action === 'next' ? 1 : -1);
      if (stepIndex < 0 || stepIndex >= program.steps.length) return pot;
      return { stepIndex, timer: stepTimer(program, stepIndex) };
    }
    case 'start':
      return pot.timer.durationMs > 0 ? { ...pot, timer: startTimer(pot.timer, nowMs) } : pot;
    case 'pause':
      return pot.timer.state === 'running' ? { ...pot, timer: pauseTimer(pot.timer, nowMs) } : pot;
    case 'resume':
      return pot.timer.state === 'paused' ? { ...pot, timer: resumeTimer(pot.timer, nowMs) } : pot;
    case 'addMinute':
      return { ...pot, timer: extendTimer(pot.timer, 60_000, nowMs) };
  }
}
