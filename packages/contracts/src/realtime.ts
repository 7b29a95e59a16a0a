import { z } from 'zod';
import type { HostAction, LiveState } from './live.ts';
import type { LiveJoined } from './live-program.ts';
import type { DyeLogChange, DyeLogCorrect, DyeLogRecord } from './dye-log.ts';
import type { Question, QuestionQueue, QuestionRemoved } from './questions.ts';

/** Sent by a client to estimate its clock offset from the server (round-trip timing). */
export const clockPingSchema = z.object({
  clientSentAtMs: z.number().finite().nonnegative(),
});
export type ClockPing = z.infer<typeof clockPingSchema>;

export interface ClockPong {
  clientSentAtMs: number;
  serverAtMs: number;
}

/** Asks for a studio's live updates; which ones depends on the asker's role there. */
export const liveActionPayloadSchema = z.object({
  sessionId: z.string().uuid(),
  action: z.unknown(),
  /**
   * The revision the host's screen showed. When given, the action is refused if the session has
   * moved on, so a retried or doubled tap (perhaps through another server) is never applied twice.
   */
  baseRevision: z.number().int().nonnegative().optional(),
});

export const studioWatchSchema = z.object({
  slug: z.string().min(1).max(64),
});
export type StudioWatch = z.infer<typeof studioWatchSchema>;

export interface RealtimeError {
  error: {
    code:
      | 'VALIDATION_FAILED'
      | 'UNAUTHENTICATED'
      | 'FORBIDDEN'
      | 'NOT_FOUND'
      | 'CONFLICT'
      | 'RATE_LIMITED';
    message: string;
  };
}

export type Ack<T> = (reply: T | RealtimeError) => void;

export interface ClientToServerEvents {
  'clock:ping': (payload: ClockPing, ack: Ack<ClockPong>) => void;
  /** Anyone may watch a studio's public updates. */
  'studio:watch': (payload: StudioWatch, ack: Ack<{ ok: true }>) => void;
  /** Hosts and moderators watch membership changes (the console's members table). */
  'members:watch': (payload: StudioWatch, ack: Ack<{ ok: true }>) => void;
  /** Anyone may follow a running live session; only the host may follow a rehearsal. */
  'live:join': (payload: { sessionId: string }, ack: Ack<LiveJoined>) => void;
  'live:leave': (payload: { sessionId: string }, ack: Ack<{ ok: true }>) => void;
  /** Only the studio's host drives pots. */
  'live:action': (
    payload: { sessionId: string; action: HostAction; baseRevision?: number },
    ack: Ack<{ state: LiveState }>,
  ) => void;
  /** Only the studio's host logs what went into a pot, and corrects it. */
  'dyeLog:record': (payload: DyeLogRecord, ack: Ack<DyeLogChange>) => void;
  'dyeLog:correct': (payload: DyeLogCorrect, ack: Ack<DyeLogChange>) => void;
  /** Anyone who may follow the session gets the queue as their role may see it, and its updates. */
  'questions:join': (payload: { sessionId: string }, ack: Ack<QuestionQueue>) => void;
  /** Signed-in people ask and add "me too" (length- and rate-limited; muted people are refused). */
  'questions:ask': (
    payload: { sessionId: string; text: string },
    ack: Ack<{ question: Question }>,
  ) => void;
  'questions:meToo': (
    payload: { sessionId: string; questionId: string },
    ack: Ack<{ question: Question }>,
  ) => void;
  /** Host and moderators answer, hide and mute. */
  'questions:answer': (
    payload: { sessionId: string; questionId: string; answer?: string },
    ack: Ack<{ question: Question }>,
  ) => void;
  'questions:hide': (
    payload: { sessionId: string; questionId: string; hidden: boolean },
    ack: Ack<{ question: Question }>,
  ) => void;
  'questions:mute': (
    payload: { sessionId: string; questionId: string; muted: boolean },
    ack: Ack<{ question: Question }>,
  ) => void;
}

export interface ServerToClientEvents {
  'server:hello': (info: { serverAtMs: number; signedIn: boolean }) => void;
  'members:changed': (info: { slug: string }) => void;
  /** The session's state: at once for the host, `streamDelayMs` late (timers shifted) for viewers. */
  'live:state': (state: LiveState) => void;
  /** To the host: how many phones follow the session. */
  'live:viewers': (info: { sessionId: string; count: number }) => void;
  /** To the host: an entry recorded or corrected (from any of the host's screens). */
  'dyeLog:changed': (change: DyeLogChange) => void;
  /** A question as the receiver's role may see it, new or changed. */
  'questions:changed': (question: Question) => void;
  /** To viewers: a question hidden by the staff. */
  'questions:removed': (info: QuestionRemoved) => void;
}
