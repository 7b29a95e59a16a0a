import { hostActionSchema, maxStreamDelayMs, type LiveState } from '@vatside/contracts/live';
import { liveJoinSchema } from '@vatside/contracts/live-program';
import { delayedTimer } from '@vatside/contracts/pot-timer';
import { liveActionPayloadSchema, type RealtimeError } from '@vatside/contracts/realtime';
import type { Database } from '@vatside/db/client';
import { studioStanding } from '../auth/authorize.ts';
import { HttpError } from '../http/errors.ts';
import type { RealtimeServer, RealtimeSocket } from '../realtime/socket-server.ts';
import { applyLiveAction, liveSessionRow, sessionState, type LiveSessionRow } from './sessions.ts';

/** The host's viewer count waits this long for more joins or leaves before it is counted. */
const viewerCountSettleMs = 500;

export const hostRoom = (sessionId: string) => `live:${sessionId}:host`;
const viewerRoom = (sessionId: string) => `live:${sessionId}:viewers`;

const refuse = (code: RealtimeError['error']['code'], message: string): RealtimeError => ({
  error: { code, message },
});

function asRefusal(error: unknown): RealtimeError {
  if (error instanceof HttpError) {
    const code =
      error.status === 404 ? 'NOT_FOUND' : error.status === 409 ? 'CONFLICT' : 'VALIDATION_FAILED';
    return refuse(code, error.message);
  }
  throw error;
}

/** Viewers' copy: timers shifted so they end when the pot ends on the delayed video. */
function viewerView(state: LiveState, streamDelayMs = state.streamDelayMs): LiveState {
  return {
    ...state,
    pots: state.pots.map((pot) => ({ ...pot, timer: delayedTimer(pot.timer, streamDelayMs) })),
  };
}

/**
 * The live session over Socket.IO. State lives in PostgreSQL (see sessions.ts); this keeps a
 * few seconds of history per session so a viewer who joins sees what the video shows.
 * That history is per process: with several processes (the Redis adapter), a viewer who joins
 * through a process that did not apply the recent actions gets the current state at once rather
 * than the delayed one, until the next action; the delayed broadcasts themselves reach everyone.
 */
export function createLiveHub(io: RealtimeServer, db: Database) {
  const history = new Map<string, { atMs: number; state: LiveState }[]>();
  // A studio and a mode never change for a session, so joins look them up once per process.
  const sessionFacts = new Map<
    string,
    Promise<{ studioId: string; mode: LiveSessionRow['mode'] }>
  >();
  // Joins share reads of the current state: one read at a time per session, and each read serves
  // every join that entered the room before it began, so 5,000 phones reconnecting at once cost
  // a handful of queries and never get a snapshot older than their place in the room.
  const queuedReads = new Map<string, Promise<LiveState>>();
  const runningReads = new Map<string, Promise<LiveState>>();
  const countTimers = new Map<string, NodeJS.Timeout>();

  function factsOf(sessionId: string) {
    let facts = sessionFacts.get(sessionId);
    if (!facts) {
      facts = liveSessionRow(db, sessionId).then((row) => ({
        studioId: row.studioId,
        mode: row.mode,
      }));
      sessionFacts.set(sessionId, facts);
      facts.catch(() => sessionFacts.delete(sessionId));
    }
    return facts;
  }

  function currentState(sessionId: string): Promise<LiveState> {
    const queued = queuedReads.get(sessionId);
    if (queued) return queued;
    const previous = runningReads.get(sessionId)?.catch(() => undefined);
    const read = Promise.resolve(previous).then(() => {
      queuedReads.delete(sessionId); // joins from now on wait for the next read
      return liveSessionRow(db, sessionId).then(sessionState);
    });
    queuedReads.set(sessionId, read);
    runningReads.set(sessionId, read);
    const done = () => {
      if (runningReads.get(sessionId) === read) runningReads.delete(sessionId);
    };
    read.then(done, done);
    return read;
  }

  function remember(state: LiveState, nowMs: number) {
    const kept = (history.get(state.sessionId) ?? []).filter(
      (h) => h.atMs >= nowMs - maxStreamDelayMs - 5_000,
    );
    kept.push({ atMs: nowMs, state });
    history.set(state.sessionId, kept);
  }

  function viewerSnapshot(current: LiveState, nowMs: number): LiveState {
    const delay = current.streamDelayMs;
    if (delay <= 0) return current;
    const seen =
      (history.get(current.sessionId) ?? []).filter((h) => h.atMs <= nowMs - delay).at(-1)?.state ??
      current;
    return viewerView({ ...seen, streamDelayMs: delay }, delay);
  }

  function broadcast(state: LiveState, nowMs: number) {
    remember(state, nowMs);
    io.to(hostRoom(state.sessionId)).emit('live:state', state);
    const shown = viewerView(state);
    const send = () => io.to(viewerRoom(state.sessionId)).emit('live:state', shown);
    if (state.streamDelayMs > 0) setTimeout(send, state.streamDelayMs).unref();
    else send();
  }

  /** Counts once the joins and leaves settle: a crowd arriving costs one count, not one each. */
  function announceViewerCount(sessionId: string) {
    if (countTimers.has(sessionId)) return;
    const timer = setTimeout(() => {
      countTimers.delete(sessionId);
      // fetchSockets asks every process through the adapter, so the count covers all of them.
      io.in(viewerRoom(sessionId))
        .fetchSockets()
        .then((sockets) =>
          io.to(hostRoom(sessionId)).emit('live:viewers', { sessionId, count: sockets.length }),
        )
        .catch(() => undefined); // a process that did not answer in time: the next count will
    }, viewerCountSettleMs);
    timer.unref();
    countTimers.set(sessionId, timer);
  }

  async function isStudioHost(socket: RealtimeSocket, studioId: string) {
    return (await studioStanding(db, studioId, socket.data.user?.id)) === 'host';
  }

  async function join(socket: RealtimeSocket, payload: unknown) {
    const parsed = liveJoinSchema.safeParse(payload);
    if (!parsed.success) return refuse('VALIDATION_FAILED', 'Send the session id.');
    const { sessionId } = parsed.data;
    const facts = await factsOf(sessionId).catch(asRefusal);
    if ('error' in facts) return facts;
    const isHost = await isStudioHost(socket, facts.studioId);
    // A rehearsal is private: to anyone but the host it does not exist.
    if (facts.mode === 'rehearsal' && !isHost)
      return refuse('NOT_FOUND', 'That live session was not found.');
    // Into the room first, then the state: any change after this read reaches the socket.
    const room = isHost ? hostRoom(sessionId) : viewerRoom(sessionId);
    await socket.join(room);
    const state = await currentState(sessionId).catch(asRefusal);
    if ('error' in state) {
      await socket.leave(room); // a rehearsal that ended in the meantime
      return state;
    }
    const nowMs = Date.now();
    announceViewerCount(sessionId);
    return {
      state: isHost ? state : viewerSnapshot(state, nowMs),
      serverNowMs: nowMs,
      view: isHost ? ('host' as const) : ('viewer' as const),
    };
  }

  async function leave(socket: RealtimeSocket, payload: unknown) {
    const parsed = liveJoinSchema.safeParse(payload);
    if (!parsed.success) return refuse('VALIDATION_FAILED', 'Send the session id.');
    await socket.leave(viewerRoom(parsed.data.sessionId));
    await socket.leave(hostRoom(parsed.data.sessionId));
    announceViewerCount(parsed.data.sessionId);
    return { ok: true as const };
  }

  async function act(socket: RealtimeSocket, payload: unknown) {
    const parsed = liveActionPayloadSchema.safeParse(payload);
    const action = hostActionSchema.safeParse(parsed.data?.action);
    if (!parsed.success || !action.success)
      return refuse('VALIDATION_FAILED', 'That is not an action the live controls send.');
    const row = await liveSessionRow(db, parsed.data.sessionId).catch(asRefusal);
    if ('error' in row) return row;
    if (!(await isStudioHost(socket, row.studioId))) {
      if (row.mode === 'rehearsal') return refuse('NOT_FOUND', 'That live session was not found.');
      return socket.data.user
        ? refuse('FORBIDDEN', 'Only the studio’s host drives the pots.')
        : refuse('UNAUTHENTICATED', 'Sign in to do this.');
    }
    const nowMs = Date.now();
    const state = await applyLiveAction(
      db,
      row.id,
      action.data,
      nowMs,
      parsed.data.baseRevision,
      row,
    ).catch(asRefusal);
    if ('error' in state) return state;
    broadcast(state, nowMs);
    return { state };
  }

  /** Viewers who drop off leave the count at once. */
  function onDisconnecting(socket: RealtimeSocket) {
    const sessions = [...socket.rooms]
      .filter((r) => r.endsWith(':viewers'))
      .map((r) => r.split(':')[1] ?? '');
    setImmediate(() => sessions.forEach(announceViewerCount));
  }

  return { join, leave, act, onDisconnecting };
}
