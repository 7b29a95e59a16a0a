import { useQuery, useQueryClient } from '@tanstack/react-query';
import { liveStateSchema, type LiveState } from '@vatside/contracts/live';
import { liveJoinedSchema } from '@vatside/contracts/live-program';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { useEffect, useState } from 'react';
import { liveStateQueryOptions, liveViewersQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

export type Connection = 'connecting' | 'online' | 'offline';
export type JoinRefusal = RealtimeError['error'] | { code: 'BAD_RESPONSE'; message: string };

/** Pause before asking again when a join got no answer. */
const rejoinAfterMs = 3_000;

/** Newer revisions win; a reply or push about an older one is late news. */
export function newerState(old: LiveState | undefined, next: LiveState): LiveState {
  return old && old.sessionId === next.sessionId && old.revision > next.revision ? old : next;
}

/**
 * The host's view of one session: joins on every (re)connect and takes the join's snapshot as
 * the truth, so nothing missed while offline lingers; pushes count only when they are newer.
 */
export function useHostSession(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const { data: state } = useQuery(liveStateQueryOptions(sessionId));
  const { data: viewerCount } = useQuery(liveViewersQueryOptions(sessionId));
  const [connection, setConnection] = useState<Connection>(
    socket.connected ? 'online' : 'connecting',
  );
  const [refusal, setRefusal] = useState<JoinRefusal | null>(null);

  useEffect(() => {
    const stateKey = liveStateQueryOptions(sessionId).queryKey;
    const viewersKey = liveViewersQueryOptions(sessionId).queryKey;
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
      // The snapshot replaces whatever was shown before the drop, unless a push that raced it
      // was newer still (revisions only grow on the server).
      queryClient.setQueryData<LiveState>(stateKey, (old) => newerState(old, joined.data.state));
    }

    const onConnect = () => {
      setConnection('online');
      void join();
    };
    const onDisconnect = () => setConnection('offline');
    const onState = (pushed: unknown) => {
      const parsed = liveStateSchema.safeParse(pushed);
      if (!parsed.success || parsed.data.sessionId !== sessionId) return;
      queryClient.setQueryData<LiveState>(stateKey, (old) => newerState(old, parsed.data));
    };
    const onViewers = (info: { sessionId: string; count: number }) => {
      if (info.sessionId === sessionId) queryClient.setQueryData(viewersKey, info.count);
    };

    socket.on('connect', onConnect);
    socket.on('disconnect', onDisconnect);
    socket.on('connect_error', onDisconnect);
    socket.on('live:state', onState);
    socket.on('live:viewers', onViewers);
    if (socket.connected) onConnect();
    return () => {
      joinCount++;
      clearTimeout(retry);
      socket.off('connect', onConnect);
      socket.off('disconnect', onDisconnect);
      socket.off('connect_error', onDisconnect);
      socket.off('live:state', onState);
      socket.off('live:viewers', onViewers);
    };
  }, [socket, sessionId, queryClient]);

  return { state, viewerCount, connection, refusal };
}
