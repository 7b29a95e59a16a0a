import type { RealtimeServer } from './socket-server.ts';
import { staffRoom } from './socket-server.ts';

/** Lets services announce changes; bound to Socket.IO once the HTTP server exists. */
export interface Notifier {
  attach(io: RealtimeServer): void;
  membersChanged(studio: { id: string; slug: string }): void;
}

export function createNotifier(): Notifier {
  let io: RealtimeServer | null = null;
  return {
    attach(server) {
      io = server;
    },
    membersChanged(studio) {
      io?.to(staffRoom(studio.id)).emit('members:changed', { slug: studio.slug });
    },
  };
}
