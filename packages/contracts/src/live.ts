import { z } from 'zod';
import {
  extendTimer,
  idleTimer,
  pauseTimer,
  potTimerSchema,
  resumeTimer,
  startTimer,
  TimerTransitionError,
} from './pot-timer.ts';

/** One pot on the stove: a colorway's bath, with its own place in its run sheet. */
export const livePotSchema = z.object({
  potId: z.string(),
  colorwayName: z.string(),
  stepIndex: z.number().int().nonnegative(),
  stepCount: z.number().int().nonnegative(),
  /** Timer length of each step, seconds (0 = no timer): the server needs it to reset timers. */
  stepTimersS: z.array(z.number().int().nonnegative()),
  timer: potTimerSchema,
});
export type LivePot = z.infer<typeof livePotSchema>;

export const liveNoteSchema = z.object({
  id: z.string(),
  atMs: z.number(),
  text: z.string().max(280),
});
export type LiveNote = z.infer<typeof liveNoteSchema>;

/** Everything a phone needs to show the session right now; sent whole on join. */
export const liveStateSchema = z.object({
  sessionId: z.string(),
  mode: z.enum(['live', 'rehearsal']),
  status: z.enum(['running', 'ended']),
  streamDelayMs: z.number().int().min(0).max(120_000),
  revision: z.number().int().nonnegative(),
  pots: z.array(livePotSchema),
  notes: z.array(liveNoteSchema),
});
export type LiveState = z.infer<typeof liveStateSchema>;

export const maxStreamDelayMs = 120_000;
const keptNotes = 20;

/**
 * The step a pot showed on the sender's screen (0-based). A pot that has moved on since refuses
 * the move: a double tap, or a second person at the controls, moves one step, not two.
 */
const fromStepSchema = z.number().int().nonnegative().optional();

/** What the host's controls send. Validated on the server before anything changes. */
export const hostActionSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('step:next'), potId: z.string(), fromStep: fromStepSchema }),
  z.object({ type: z.literal('step:previous'), potId: z.string(), fromStep: fromStepSchema }),
  z.object({ type: z.literal('timer:start'), potId: z.string() }),
  z.object({ type: z.literal('timer:pause'), potId: z.string() }),
  z.object({ type: z.literal('timer:resume'), potId: z.string() }),
  z.object({
    type: z.literal('timer:extend'),
    potId: z.string(),
    byMs: z.union([z.literal(60_000), z.literal(300_000)]),
  }),
  z.object({ type: z.literal('note:push'), text: z.string().trim().min(1).max(280) }),
  z.object({
    type: z.literal('delay:set'),
    streamDelayMs: z.number().int().min(0).max(maxStreamDelayMs),
  }),
  z.object({ type: z.literal('session:end') }),
]);
export type HostAction = z.infer<typeof hostActionSchema>;

export class LiveActionError extends Error {}

/** Timer refusals become the same plain error as every other refusal. */
function plainly<T>(work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (error instanceof TimerTransitionError) throw new LiveActionError(error.message);
    throw error;
  }
}

const stepTimer = (pot: LivePot, stepIndex: number) =>
  idleTimer((pot.stepTimersS[stepIndex] ?? 0) * 1000);

function updatePot(state: LiveState, potId: string, change: (pot: LivePot) => LivePot): LiveState {
  const pot = state.pots.find((p) => p.potId === potId);
  if (!pot) throw new LiveActionError('That pot is not in this session.');
  return { ...state, pots: state.pots.map((p) => (p.potId === potId ? change(p) : p)) };
}

function moveStep(pot: LivePot, by: 1 | -1, fromStep: number | undefined): LivePot {
  if (fromStep !== undefined && pot.stepIndex !== fromStep) {
    throw new LiveActionError(
      `${pot.colorwayName} is already on step ${pot.stepIndex + 1}; your screen was behind. Check it and tap again.`,
    );
  }
  const stepIndex = pot.stepIndex + by;
  if (stepIndex < 0 || stepIndex >= pot.stepCount) {
    throw new LiveActionError(
      by > 0 ? 'This pot is on its last step.' : 'This pot is on its first step.',
    );
  }
  return { ...pot, stepIndex, timer: stepTimer(pot, stepIndex) };
}

/**
 * The host's action applied to the session: a pure function, so every server process and every
 * test computes the same next state. Refusals throw LiveActionError with a plain reason.
 */
export function applyHostAction(
  state: LiveState,
  action: HostAction,
  nowMs: number,
  noteId: () => string,
): LiveState {
  if (state.status === 'ended') throw new LiveActionError('This session has ended.');
  const next = ((): LiveState => {
    switch (action.type) {
      case 'step:next':
        return updatePot(state, action.potId, (pot) => moveStep(pot, 1, action.fromStep));
      case 'step:previous':
        return updatePot(state, action.potId, (pot) => moveStep(pot, -1, action.fromStep));
      case 'timer:start':
        return updatePot(state, action.potId, (pot) => {
          if (pot.timer.durationMs <= 0)
            throw new LiveActionError('This step has no timer; extend it to add time.');
          return { ...pot, timer: startTimer(pot.timer, nowMs) };
        });
      case 'timer:pause':
        return updatePot(state, action.potId, (pot) => ({
          ...pot,
          timer: plainly(() => pauseTimer(pot.timer, nowMs)),
        }));
      case 'timer:resume':
        return updatePot(state, action.potId, (pot) => ({
          ...pot,
          timer: plainly(() => resumeTimer(pot.timer, nowMs)),
        }));
      case 'timer:extend':
        return updatePot(state, action.potId, (pot) => ({
          ...pot,
          timer: extendTimer(pot.timer, action.byMs, nowMs),
        }));
      case 'note:push':
        return {
          ...state,
          notes: [...state.notes, { id: noteId(), atMs: nowMs, text: action.text }].slice(
            -keptNotes,
          ),
        };
      case 'delay:set':
        return { ...state, streamDelayMs: action.streamDelayMs };
      case 'session:end':
        return { ...state, status: 'ended' };
    }
  })();
  return { ...next, revision: state.revision + 1 };
}
