import { describe, expect, it } from 'vitest';
import { program, rockPot } from '../../../testing/live-fixtures.ts';
import { applyOwnPace, takeOver, type OwnPot } from './own-pace.ts';

const [sea, rock] = program.pots as [(typeof program.pots)[0], (typeof program.pots)[0]];

describe('own pace', () => {
  it('takes over the host’s step with the time left, on this phone’s clock', () => {
    const serverNowMs = 1_000_000;
    const localNowMs = 5_000_000; // this phone's clock reads differently
    const host = rockPot({
      stepIndex: 0,
      timer: {
        state: 'running',
        durationMs: 600_000,
        startedAtMs: serverNowMs - 60_000,
        endsAtMs: serverNowMs + 540_000,
      },
    });
    expect(takeOver(rock, host, serverNowMs, localNowMs)).toEqual({
      stepIndex: 0,
      timer: {
        state: 'running',
        durationMs: 600_000,
        startedAtMs: localNowMs - 60_000,
        endsAtMs: localNowMs + 540_000,
      },
    });
  });

  it('starts at the first step when the host’s pot is unknown', () => {
    expect(takeOver(sea, undefined, 0, 0)).toEqual({
      stepIndex: 0,
      timer: { state: 'idle', durationMs: 1_800_000 },
    });
  });

  it('moves through the run sheet with each step’s own timer, and stops at both ends', () => {
    const first: OwnPot = { stepIndex: 0, timer: { state: 'idle', durationMs: 1_800_000 } };
    const second = applyOwnPace(first, 'next', sea, 0);
    expect(second).toEqual({ stepIndex: 1, timer: { state: 'idle', durationMs: 0 } });
    const third = applyOwnPace(second, 'next', sea, 0);
    expect(third.stepIndex).toBe(2);
    expect(applyOwnPace(third, 'next', sea, 0)).toBe(third);
    expect(applyOwnPace(first, 'previous', sea, 0)).toBe(first);
  });

  it('starts, pauses, resumes and adds a minute', () => {
    const idle: OwnPot = { stepIndex: 2, timer: { state: 'idle', durationMs: 1_200_000 } };
    const running = applyOwnPace(idle, 'start', sea, 10_000);
    expect(running.timer).toMatchObject({ state: 'running', endsAtMs: 1_210_000 });
    const paused = applyOwnPace(running, 'pause', sea, 70_000);
    expect(paused.timer).toMatchObject({ state: 'paused', remainingMs: 1_140_000 });
    const resumed = applyOwnPace(paused, 'resume', sea, 100_000);
    expect(resumed.timer).toMatchObject({ state: 'running', endsAtMs: 1_240_000 });
    expect(applyOwnPace(resumed, 'addMinute', sea, 100_000).timer).toMatchObject({
      endsAtMs: 1_300_000,
    });
    // A step without a timer has nothing to start.
    const noTimer: OwnPot = { stepIndex: 1, timer: { state: 'idle', durationMs: 0 } };
    expect(applyOwnPace(noTimer, 'start', sea, 0)).toBe(noTimer);
  });
});
