import { z } from 'zod';
import type { HostAction, LiveState } from './live.ts';
import type { LiveJoined } from './live-program.ts';

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
});

export const studioWatchSchema = z.object({
  slug: z.string().min(1).max(64),
});
export type StudioWatch = z.infer<typeof studioWatchSchema>;

export interface RealtimeError {
  error: {
    code: 'VALIDATION_FAILED' | 'UNAUTHENTICATED' | 'FORBIDDEN' | 'NOT_FOUND' | 'CONFLICT';
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
    payload: { sessionId: string; action: HostAction },
    ack: Ack<{ state: LiveState }>,
  ) => void;
}

export interface ServerToClientEvents {
  'server:hello': (info: { serverAtMs: number; signedIn: boolean }) => void;
  'members:changed': (info: { slug: string }) => void;
  /** The session's state: at once for the host, `streamDelayMs` late (timers shifted) for viewers. */
  'live:state': (state: LiveState) => void;
  /** To the host: how many phones follow the session. */
  'live:viewers': (info: { sessionId: string; count: number }) => void;
}
