import { hostActionSchema, maxStreamDelayMs, type LiveState } from '@vatside/contracts/live';
import { liveJoinSchema } from '@vatside/contracts/live-program';
import { delayedTimer } from '@vatside/contracts/pot-timer';
import { liveActionPayloadSchema, type RealtimeError } from '@vatside/contracts/realtime';
import type { Database } from '@vatside/db/client';
import { studioStanding } from '../auth/authorize.ts';
import { HttpError } from '../http/errors.ts';
import type { RealtimeServer, RealtimeSocket } from '../realtime/socket-server.ts';
import { applyLiveAction, liveSessionRow, sessionState } from './sessions.ts';

const hostRoom = (sessionId: string) => `live:${sessionId}:host`;
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
 */
export function createLiveHub(io: RealtimeServer, db: Database) {
  const history = new Map<string, { atMs: number; state: LiveState }[]>();

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

  async function announceViewerCount(sessionId: string) {
    const count = (await io.in(viewerRoom(sessionId)).fetchSockets()).length;
    io.to(hostRoom(sessionId)).emit('live:viewers', { sessionId, count });
  }

  async function isStudioHost(socket: RealtimeSocket, studioId: string) {
    return (await studioStanding(db, studioId, socket.data.user?.id)) === 'host';
  }

  async function join(socket: RealtimeSocket, payload: unknown) {
    const parsed = liveJoinSchema.safeParse(payload);
    if (!parsed.success) return refuse('VALIDATION_FAILED', 'Send the session id.');
    const { sessionId } = parsed.data;
    const row = await liveSessionRow(db, sessionId).catch(asRefusal);
    if ('error' in row) return row;
    const isHost = await isStudioHost(socket, row.studioId);
    // A rehearsal is private: to anyone but the host it does not exist.
    if (row.mode === 'rehearsal' && !isHost)
      return refuse('NOT_FOUND', 'That live session was not found.');
    const nowMs = Date.now();
    const state = sessionState(row);
    await socket.join(isHost ? hostRoom(sessionId) : viewerRoom(sessionId));
    if (!isHost) void announceViewerCount(sessionId);
    else void announceViewerCount(sessionId);
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
    void announceViewerCount(parsed.data.sessionId);
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
    const state = await applyLiveAction(db, row.id, action.data, nowMs).catch(asRefusal);
    if ('error' in state) return state;
    broadcast(state, nowMs);
    return { state };
  }

  /** Viewers who drop off leave the count at once. */
  function onDisconnecting(socket: RealtimeSocket) {
    const sessions = [...socket.rooms]
      .filter((r) => r.endsWith(':viewers'))
      .map((r) => r.split(':')[1] ?? '');
    setImmediate(() => sessions.forEach((id) => void announceViewerCount(id)));
  }

  return { join, leave, act, onDisconnecting };
}
