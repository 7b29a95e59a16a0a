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

export type Ack<T> = (reply: T | { error: { code: string; message: string } }) => void;

export interface ClientToServerEvents {
  'clock:ping': (payload: ClockPing, ack: Ack<ClockPong>) => void;
}

export interface ServerToClientEvents {
  'server:hello': (info: { serverAtMs: number }) => void;
}
