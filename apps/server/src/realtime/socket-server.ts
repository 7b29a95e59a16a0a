import type { Server as HttpServer } from 'node:http';
import { fromNodeHeaders } from 'better-auth/node';
import { Server, type Socket } from 'socket.io';
import type { z } from 'zod';
import {
  clockPingSchema,
  studioWatchSchema,
  type Ack,
  type ClientToServerEvents,
  type RealtimeError,
  type ServerToClientEvents,
} from '@vatside/contracts/realtime';
import { eq } from '@vatside/db/sql';
import { studios } from '@vatside/db/schema';
import { studioStanding, type SessionUser } from '../auth/authorize.ts';
import { can, type StudioAction } from '../auth/policy.ts';
import type { AppDeps } from '../deps.ts';
import { createDyeLogHub } from '../live/dye-log-hub.ts';
import { createLiveHub } from '../live/live-hub.ts';
import { createQuestionHub } from '../live/question-hub.ts';

interface SocketData {
  user: SessionUser | null;
}

export type RealtimeServer = Server<
  ClientToServerEvents,
  ServerToClientEvents,
  Record<string, never>,
  SocketData
>;
export type RealtimeSocket = Socket<
  ClientToServerEvents,
  ServerToClientEvents,
  Record<string, never>,
  SocketData
>;

/** Every client event name, so the access-matrix test can enumerate them. */
export const clientEventNames = [
  'clock:ping',
  'studio:watch',
  'members:watch',
  'live:join',
  'live:leave',
  'live:action',
  'dyeLog:record',
  'dyeLog:correct',
  'questions:join',
  'questions:ask',
  'questions:meToo',
  'questions:answer',
  'questions:hide',
  'questions:mute',
] as const satisfies readonly (keyof ClientToServerEvents)[];

export const staffRoom = (studioId: string) => `studio:${studioId}:staff`;
const publicRoom = (studioId: string) => `studio:${studioId}`;

const refuse = (code: RealtimeError['error']['code'], message: string): RealtimeError => ({
  error: { code, message },
});

export function createRealtime(
  httpServer: HttpServer,
  { config, auth, database }: AppDeps,
): RealtimeServer {
  const io: RealtimeServer = new Server(httpServer, {
    cors: { origin: config.PUBLIC_ORIGIN, credentials: true },
    maxHttpBufferSize: 16 * 1024,
    // CORS does not cover WebSocket upgrades: a page on another site could open one with the
    // viewer's cookie. Browsers always send Origin, so a foreign one is refused at the handshake;
    // scripts and load tests send none and carry no browser cookie.
    allowRequest: (req, callback) => {
      const origin = req.headers.origin;
      callback(null, !origin || origin === new URL(config.PUBLIC_ORIGIN).origin);
    },
  });

  // The handshake carries the same session cookie as the REST API; visitors connect too.
  io.use(async (socket, next) => {
    // Most phones at a live are visitors: without a session cookie there is nothing to look up,
    // which keeps thousands of reconnects at once from queueing behind session lookups.
    const hasSession = socket.handshake.headers.cookie?.includes('session_token') ?? false;
    const session = hasSession
      ? await auth.api
          .getSession({ headers: fromNodeHeaders(socket.handshake.headers) })
          .catch(() => null)
      : null;
    socket.data.user = session?.user ?? null;
    next();
  });

  /** Validates a payload, then checks the sender's standing in the named studio. */
  async function authorizeWatch(socket: RealtimeSocket, payload: unknown, action: StudioAction) {
    const parsed = studioWatchSchema.safeParse(payload);
    if (!parsed.success) return refuse('VALIDATION_FAILED', 'Send the studio slug.');
    const [studio] = await database.db
      .select({ id: studios.id })
      .from(studios)
      .where(eq(studios.slug, parsed.data.slug));
    if (!studio) return refuse('NOT_FOUND', 'That studio was not found.');
    const standing = await studioStanding(database.db, studio.id, socket.data.user?.id);
    if (!can(standing, action)) {
      return socket.data.user
        ? refuse('FORBIDDEN', 'Your role in this studio does not allow this.')
        : refuse('UNAUTHENTICATED', 'Sign in to do this.');
    }
    return { studioId: studio.id };
  }

  function handle<P, R>(
    socket: RealtimeSocket,
    work: (payload: P) => Promise<R | RealtimeError> | R | RealtimeError,
  ): (payload: P, ack: Ack<R>) => void {
    return (payload, ack) => {
      if (typeof ack !== 'function') return;
      Promise.resolve(work(payload))
        .then(ack)
        .catch(() => ack(refuse('VALIDATION_FAILED', 'The request could not be handled.')));
    };
  }

  const live = createLiveHub(io, database.db);
  const dyeLog = createDyeLogHub(io, database.db);
  const questions = createQuestionHub(io, database.db, config);

  io.on('connection', (socket) => {
    socket.on(
      'live:join',
      handle(socket, (payload) => live.join(socket, payload)),
    );
    socket.on(
      'live:leave',
      handle(socket, (payload) => live.leave(socket, payload)),
    );
    socket.on(
      'live:action',
      handle(socket, (payload) => live.act(socket, payload)),
    );
    socket.on('disconnecting', () => live.onDisconnecting(socket));
    socket.on(
      'dyeLog:record',
      handle(socket, (payload) => dyeLog.record(socket, payload)),
    );
    socket.on(
      'dyeLog:correct',
      handle(socket, (payload) => dyeLog.correct(socket, payload)),
    );
    socket.on(
      'questions:join',
      handle(socket, (payload) => questions.join(socket, payload)),
    );
    socket.on(
      'questions:ask',
      handle(socket, (payload) => questions.ask(socket, payload)),
    );
    socket.on(
      'questions:meToo',
      handle(socket, (payload) => questions.meToo(socket, payload)),
    );
    socket.on(
      'questions:answer',
      handle(socket, (payload) => questions.answer(socket, payload)),
    );
    socket.on(
      'questions:hide',
      handle(socket, (payload) => questions.hide(socket, payload)),
    );
    socket.on(
      'questions:mute',
      handle(socket, (payload) => questions.mute(socket, payload)),
    );

    socket.emit('server:hello', { serverAtMs: Date.now(), signedIn: socket.data.user !== null });

    socket.on(
      'clock:ping',
      handle(socket, (payload: z.input<typeof clockPingSchema>) => {
        const parsed = clockPingSchema.safeParse(payload);
        if (!parsed.success) return refuse('VALIDATION_FAILED', 'clock:ping needs clientSentAtMs.');
        return { clientSentAtMs: parsed.data.clientSentAtMs, serverAtMs: Date.now() };
      }),
    );

    socket.on(
      'studio:watch',
      handle(socket, async (payload) => {
        const result = await authorizeWatch(socket, payload, 'studio:read');
        if ('error' in result) return result;
        await socket.join(publicRoom(result.studioId));
        return { ok: true as const };
      }),
    );

    socket.on(
      'members:watch',
      handle(socket, async (payload) => {
        const result = await authorizeWatch(socket, payload, 'members:read');
        if ('error' in result) return result;
        await socket.join(staffRoom(result.studioId));
        return { ok: true as const };
      }),
    );
  });
  return io;
}
