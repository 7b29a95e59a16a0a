import type { Server as HttpServer } from 'node:http';
import { Server } from 'socket.io';
import {
  clockPingSchema,
  type ClientToServerEvents,
  type ServerToClientEvents,
} from '@vatside/contracts/realtime';
import type { AppDeps } from '../deps.ts';

export type RealtimeServer = Server<ClientToServerEvents, ServerToClientEvents>;

/** Every client event name, so the access-matrix test can enumerate them. */
export const clientEventNames = [
  'clock:ping',
] as const satisfies readonly (keyof ClientToServerEvents)[];

export function createRealtime(httpServer: HttpServer, { config }: AppDeps): RealtimeServer {
  const io: RealtimeServer = new Server(httpServer, {
    cors: { origin: config.PUBLIC_ORIGIN, credentials: true },
    maxHttpBufferSize: 16 * 1024,
  });
  io.on('connection', (socket) => {
    socket.emit('server:hello', { serverAtMs: Date.now() });
    socket.on('clock:ping', (payload, ack) => {
      if (typeof ack !== 'function') return;
      const parsed = clockPingSchema.safeParse(payload);
      if (!parsed.success) {
        ack({ error: { code: 'VALIDATION_FAILED', message: 'clock:ping needs clientSentAtMs.' } });
        return;
      }
      ack({ clientSentAtMs: parsed.data.clientSentAtMs, serverAtMs: Date.now() });
    });
  });
  return io;
}
