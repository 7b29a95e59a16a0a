import { z } from 'zod';

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
export const studioWatchSchema = z.object({
  slug: z.string().min(1).max(64),
});
export type StudioWatch = z.infer<typeof studioWatchSchema>;

export interface RealtimeError {
  error: {
    code: 'VALIDATION_FAILED' | 'UNAUTHENTICATED' | 'FORBIDDEN' | 'NOT_FOUND';
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
}

export interface ServerToClientEvents {
  'server:hello': (info: { serverAtMs: number; signedIn: boolean }) => void;
  'members:changed': (info: { slug: string }) => void;
}
