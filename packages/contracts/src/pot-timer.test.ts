import { describe, expect, it } from 'vitest';
import {
  delayedTimer,
  extendTimer,
  formatCountdown,
  idleTimer,
  isTimerDone,
  pauseTimer,
  remainingMs,
  resumeTimer,
  startTimer,
  TimerTransitionError,
} from './pot-timer.ts';

const min = 60_000;

describe('pot timer arithmetic (absolute server times)', () => {
  it('counts down from start and is done at its end time', () => {
    const t = startTimer(idleTimer(10 * min), 1_000);
    expect(remainingMs(t, 1_000 + 4 * min)).toBe(6 * min);
    expect(isTimerDone(t, 1_000 + 10 * min - 1)).toBe(false);
    expect(isTimerDone(t, 1_000 + 10 * min)).toBe(true);
    expect(remainingMs(t, 1_000 + 11 * min)).toBe(0);
  });

  it('pause keeps what was left; resume restarts the clock from then', () => {
    const running = startTimer(idleTimer(10 * min), 0);
    const paused = pauseTimer(running, 3 * min);
    expect(remainingMs(paused, 50 * min)).toBe(7 * min);
    const resumed = resumeTimer(paused, 20 * min);
    expect(resumed).toMatchObject({ state: 'running', endsAtMs: 27 * min });
  });

  it('extend adds to running, paused and idle timers, and restarts a finished one from now', () => {
    const running = startTimer(idleTimer(5 * min), 0);
    expect(extendTimer(running, min, 2 * min)).toMatchObject({
      endsAtMs: 6 * min,
      durationMs: 6 * min,
    });
    expect(extendTimer(pauseTimer(running, min), 5 * min, 9 * min)).toMatchObject({
      remainingMs: 9 * min,
    });
    expect(extendTimer(idleTimer(min), min, 0)).toEqual(idleTimer(2 * min));
    expect(extendTimer(running, min, 8 * min)).toMatchObject({ endsAtMs: 9 * min });
  });

  it('survives a restart in the middle: the stored end time still gives the right countdown', () => {
    const stored = JSON.parse(JSON.stringify(startTimer(idleTimer(15 * min), 100_000)));
    expect(remainingMs(stored, 100_000 + 9 * min)).toBe(6 * min);
  });

  it('a stream delay shifts a running timer so it ends when the pot ends on the viewer’s video', () => {
    const t = startTimer(idleTimer(2 * min), 0);
    const seen = delayedTimer(t, 8_000);
    expect(remainingMs(seen, 2 * min)).toBe(8_000);
    expect(delayedTimer(pauseTimer(t, min), 8_000)).toEqual(pauseTimer(t, min));
  });

  it('refuses transitions that make no sense', () => {
    expect(() => pauseTimer(idleTimer(min), 0)).toThrow(TimerTransitionError);
    expect(() => resumeTimer(startTimer(idleTimer(min), 0), 0)).toThrow(TimerTransitionError);
    expect(() => extendTimer(idleTimer(min), 0, 0)).toThrow(RangeError);
  });

  it('formats countdowns, rounding up', () => {
    expect(formatCountdown(0)).toBe('0:00');
    expect(formatCountdown(1)).toBe('0:01');
    expect(formatCountdown(61_000)).toBe('1:01');
    expect(formatCountdown(3_600_000 + 5_000)).toBe('1:00:05');
  });
});
