import { useQuery, useQueryClient } from '@tanstack/react-query';
import { liveStateSchema, type LiveState } from '@vatside/contracts/live';
import { liveJoinedSchema } from '@vatside/contracts/live-program';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { useEffect, useState } from 'react';
import { liveStateQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

export type Connection = 'connecting' | 'online' | 'offline';
export type JoinRefusal = RealtimeError['error'] | { code: 'BAD_RESPONSE'; message: string };

/** Pause before asking again when a join got no answer. */
const rejoinAfterMs = 3_000;

/**
 * Follows one session: joins on every (re)connect and whenever the page becomes visible again,
 * and takes the join's snapshot as the truth; pushes count only when they are newer.
 */
export function useLiveSession(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const { data: state } = useQuery(liveStateQueryOptions(sessionId));
  const [connection, setConnection] = useState<Connection>(
    socket.connected ? 'online' : 'connecting',
  );
  const [refusal, setRefusal] = useState<JoinRefusal | null>(null);

  useEffect(() => {
    const { queryKey } = liveStateQueryOptions(sessionId);
    // Newest push on this connection: a snapshot answered after it must not undo it.
    let pushedRevision = -1;
    let joinCount = 0;
    let retry: ReturnType<typeof setTimeout> | undefined;

    async function join() {
      const thisJoin = ++joinCount;
      clearTimeout(retry);
      let reply: unknown;
      try {
        reply = await socket.timeout(ackTimeoutMs).emitWithAck('live:join', { sessionId });
      } catch {
        if (thisJoin === joinCount && socket.connected) retry = setTimeout(join, rejoinAfterMs);
        return;
      }
      if (thisJoin !== joinCount) return;
      if (reply && typeof reply === 'object' && 'error' in reply) {
        setRefusal((reply as RealtimeError).error);
        return;
      }
      const joined = liveJoinedSchema.safeParse(reply);
      if (!joined.success) {
        setRefusal({ code: 'BAD_RESPONSE', message: 'The server sent something unexpected.' });
        return;
      }
      setRefusal(null);
      const snapshot = joined.data.state;
      queryClient.setQueryData<LiveState>(queryKey, (old) =>
        old && pushedRevision > snapshot.revision ? old : snapshot,
      );
    }

    const onConnect = () => {
      pushedRevision = -1;
      setConnection('online');
      void join();
    };
    const onDisconnect = () => setConnection('offline');
    const onState = (pushed: unknown) => {
      const parsed = liveStateSchema.safeParse(pushed);
      if (!parsed.success || parsed.data.sessionId !== sessionId) return;
      const next = parsed.data;
      pushedRevision = Math.max(pushedRevision, next.revision);
      queryClient.setQueryData<LiveState>(queryKey, (old) =>
        !old || next.revision > old.revision ? next : old,
      );
    };
    // A phone coming back from the lock screen may hold a socket that has not noticed the drop.
    const onVisible = () => {
      if (document.visibilityState === 'visible' && socket.connected) void join();
    };

    socket.on('connect', onConnect);
    socket.on('disconnect', onDisconnect);
    socket.on('connect_error', onDisconnect);
    socket.on('live:state', onState);
    document.addEventListener('visibilitychange', onVisible);
    if (socket.connected) onConnect();
    return () => {
      joinCount++;
      clearTimeout(retry);
      socket.off('connect', onConnect);
      socket.off('disconnect', onDisconnect);
      socket.off('connect_error', onDisconnect);
      socket.off('live:state', onState);
      document.removeEventListener('visibilitychange', onVisible);
      if (socket.connected) socket.emit('live:leave', { sessionId }, () => undefined);
    };
  }, [socket, sessionId, queryClient]);

  return { state, connection, refusal };
}
