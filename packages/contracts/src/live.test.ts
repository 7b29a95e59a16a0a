import { describe, expect, it } from 'vitest';
import { applyHostAction, hostActionSchema, LiveActionError, type LiveState } from './live.ts';
import { remainingMs } from './pot-timer.ts';

const min = 60_000;
let n = 0;
const noteId = () => `note-${++n}`;

const session = (): LiveState => ({
  sessionId: 's1',
  mode: 'live',
  status: 'running',
  streamDelayMs: 0,
  revision: 0,
  notes: [],
  pots: [
    {
      potId: 'lagoon',
      colorwayName: 'Lagoon',
      stepIndex: 0,
      stepCount: 3,
      stepTimersS: [0, 600, 300],
      timer: { state: 'idle', durationMs: 0 },
    },
    {
      potId: 'kelp',
      colorwayName: 'Kelp',
      stepIndex: 0,
      stepCount: 2,
      stepTimersS: [120, 0],
      timer: { state: 'idle', durationMs: 120_000 },
    },
  ],
});

describe('live session: the host’s actions', () => {
  it('each pot keeps its own step and timer', () => {
    let s = applyHostAction(session(), { type: 'step:next', potId: 'lagoon' }, 0, noteId);
    s = applyHostAction(s, { type: 'timer:start', potId: 'lagoon' }, 1_000, noteId);
    s = applyHostAction(s, { type: 'timer:start', potId: 'kelp' }, 2_000, noteId);
    expect(s.pots[0]).toMatchObject({
      stepIndex: 1,
      timer: { state: 'running', endsAtMs: 1_000 + 10 * min },
    });
    expect(s.pots[1]).toMatchObject({
      stepIndex: 0,
      timer: { state: 'running', endsAtMs: 2_000 + 2 * min },
    });
    expect(s.revision).toBe(3);
  });

  it('moving to the next step resets the timer to that step’s length', () => {
    let s = applyHostAction(session(), { type: 'step:next', potId: 'lagoon' }, 0, noteId);
    s = applyHostAction(s, { type: 'timer:start', potId: 'lagoon' }, 0, noteId);
    s = applyHostAction(s, { type: 'step:next', potId: 'lagoon' }, 30_000, noteId);
    expect(s.pots[0]?.timer).toEqual({ state: 'idle', durationMs: 5 * min });
  });

  it('pause, extend and resume keep the arithmetic of the timer', () => {
    let s = applyHostAction(session(), { type: 'timer:start', potId: 'kelp' }, 0, noteId);
    s = applyHostAction(s, { type: 'timer:pause', potId: 'kelp' }, 30_000, noteId);
    s = applyHostAction(s, { type: 'timer:extend', potId: 'kelp', byMs: 60_000 }, 40_000, noteId);
    s = applyHostAction(s, { type: 'timer:resume', potId: 'kelp' }, 100_000, noteId);
    const kelp = s.pots[1];
    expect(kelp && remainingMs(kelp.timer, 100_000)).toBe(150_000);
  });

  it('moves a pot one step for a double tap: the second, sent from the same screen, is refused', () => {
    const tap = { type: 'step:next', potId: 'lagoon', fromStep: 0 } as const;
    const once = applyHostAction(session(), tap, 0, noteId);
    expect(once.pots[0]?.stepIndex).toBe(1);
    expect(() => applyHostAction(once, tap, 500, noteId)).toThrow(/already on step 2/);
    // From the screen that shows step 2, the move goes ahead.
    const twice = applyHostAction(once, { ...tap, fromStep: 1 }, 1_000, noteId);
    expect(twice.pots[0]?.stepIndex).toBe(2);
  });

  it('refuses what makes no sense, with a plain reason', () => {
    const s = session();
    expect(() => applyHostAction(s, { type: 'step:previous', potId: 'lagoon' }, 0, noteId)).toThrow(
      /first step/,
    );
    expect(() => applyHostAction(s, { type: 'timer:start', potId: 'lagoon' }, 0, noteId)).toThrow(
      /no timer/,
    );
    expect(() => applyHostAction(s, { type: 'timer:pause', potId: 'kelp' }, 0, noteId)).toThrow(
      LiveActionError,
    );
    expect(() => applyHostAction(s, { type: 'step:next', potId: 'nope' }, 0, noteId)).toThrow(
      /not in this session/,
    );
    const ended = applyHostAction(s, { type: 'session:end' }, 0, noteId);
    expect(() => applyHostAction(ended, { type: 'note:push', text: 'hi' }, 0, noteId)).toThrow(
      /ended/,
    );
  });

  it('keeps the last notes and the stream delay', () => {
    let s = session();
    for (let i = 0; i < 25; i++)
      s = applyHostAction(s, { type: 'note:push', text: `note ${i}` }, i, noteId);
    s = applyHostAction(s, { type: 'delay:set', streamDelayMs: 8_000 }, 30, noteId);
    expect(s.notes).toHaveLength(20);
    expect(s.notes.at(-1)?.text).toBe('note 24');
    expect(s.streamDelayMs).toBe(8_000);
  });

  it('validates actions: extend only by one or five minutes, delay within two minutes, notes short', () => {
    expect(
      hostActionSchema.safeParse({ type: 'timer:extend', potId: 'kelp', byMs: 90_000 }).success,
    ).toBe(false);
    expect(hostActionSchema.safeParse({ type: 'delay:set', streamDelayMs: 600_000 }).success).toBe(
      false,
    );
    expect(hostActionSchema.safeParse({ type: 'note:push', text: 'x'.repeat(281) }).success).toBe(
      false,
    );
    expect(
      hostActionSchema.safeParse({ type: 'note:push', text: '  add the acid now  ' }).success,
    ).toBe(true);
  });
});
