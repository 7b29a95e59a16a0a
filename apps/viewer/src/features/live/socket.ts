import type { ClientToServerEvents, ServerToClientEvents } from '@vatside/contracts/realtime';
import { io, type Socket } from 'socket.io-client';

export type LiveSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** How long a phone waits for an answer before counting the request as lost. */
export const ackTimeoutMs = 8_000;

/**
 * A socket to this page's own origin (the session cookie rides along). It connects when the
 * follow-along opens and reconnects by itself after a drop, with socket.io-client's backoff.
 */
export function openLiveSocket(): LiveSocket {
  return io({ autoConnect: false, withCredentials: true });
}
