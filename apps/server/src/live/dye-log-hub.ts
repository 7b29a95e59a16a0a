import { dyeLogCorrectSchema, dyeLogRecordSchema } from '@vatside/contracts/dye-log';
import type { RealtimeError } from '@vatside/contracts/realtime';
import type { Database } from '@vatside/db/client';
import type { RealtimeServer, RealtimeSocket } from '../realtime/socket-server.ts';
import { correctDyeLogEntry, recordDyeLogEntry } from './dye-log.ts';
import { hostRoom } from './live-hub.ts';
import { refusing, requireSessionRole, sessionAccess } from './session-access.ts';

const invalid = (message: string): RealtimeError => ({
  error: { code: 'VALIDATION_FAILED', message },
});

/** The host's dye log over Socket.IO; every change goes to all of the host's screens. */
export function createDyeLogHub(io: RealtimeServer, db: Database) {
  async function hostOf(socket: RealtimeSocket, sessionId: string) {
    const who = await sessionAccess(db, sessionId, socket.data.user?.id);
    requireSessionRole(who, 'live:log');
    return { row: who.row, userId: who.userId! };
  }

  async function record(socket: RealtimeSocket, payload: unknown) {
    const parsed = dyeLogRecordSchema.safeParse(payload);
    if (!parsed.success)
      return invalid(
        'Send the pot, its recipe line and an amount from 0 up (or none: as planned).',
      );
    return refusing(async () => {
      const { row, userId } = await hostOf(socket, parsed.data.sessionId);
      const change = await recordDyeLogEntry(db, row, parsed.data, userId);
      io.to(hostRoom(row.id)).emit('dyeLog:changed', change);
      return change;
    });
  }

  async function correct(socket: RealtimeSocket, payload: unknown) {
    const parsed = dyeLogCorrectSchema.safeParse(payload);
    if (!parsed.success)
      return invalid('Send the entry, the right amount (0 voids it) and a reason.');
    return refusing(async () => {
      const { row, userId } = await hostOf(socket, parsed.data.sessionId);
      const change = await correctDyeLogEntry(db, row, parsed.data, userId);
      io.to(hostRoom(row.id)).emit('dyeLog:changed', change);
      return change;
    });
  }

  return { record, correct };
}
