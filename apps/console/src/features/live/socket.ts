import type { ClientToServerEvents, ServerToClientEvents } from '@vatside/contracts/realtime';
import { io, type Socket } from 'socket.io-client';

export type LiveSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** How long the board waits for the server's answer before counting a request as lost. */
export const ackTimeoutMs = 8_000;

/**
 * A socket to the console's own origin, where the host's session cookie rides along. It
 * reconnects by itself after a drop, with socket.io-client's backoff.
 */
export function openHostSocket(): LiveSocket {
  return io({ autoConnect: false, withCredentials: true });
}
