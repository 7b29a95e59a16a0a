import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { DyeLogChange } from '@vatside/contracts/dye-log';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { useCallback, useEffect, useState } from 'react';
import { dyeLogQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

type Reply = DyeLogChange | RealtimeError;

/**
 * The host's dye log: the REST log, refetched whenever any of the host's screens records or
 * corrects an entry. Refusals are kept per pot until the next try there.
 */
export function useDyeLog(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const log = useQuery(dyeLogQueryOptions(sessionId));
  const [refusals, setRefusals] = useState<Record<string, string>>({});

  useEffect(() => {
    const onChanged = (change: DyeLogChange) => {
      if (change.entry.sessionId !== sessionId) return;
      void queryClient.invalidateQueries({ queryKey: dyeLogQueryOptions(sessionId).queryKey });
    };
    socket.on('dyeLog:changed', onChanged);
    return () => {
      socket.off('dyeLog:changed', onChanged);
    };
  }, [socket, sessionId, queryClient]);

  const settle = useCallback(
    async (potId: string, sending: () => Promise<Reply>): Promise<boolean> => {
      if (!socket.connected) {
        setRefusals((r) => ({ ...r, [potId]: 'Offline: nothing was logged. Try again soon.' }));
        return false;
      }
      let message: string | null;
      try {
        const reply = await sending();
        message = 'error' in reply ? reply.error.message : null;
      } catch {
        message = 'The server did not answer in time. Check the log before trying again.';
      }
      setRefusals(({ [potId]: _old, ...rest }) => (message ? { ...rest, [potId]: message } : rest));
      if (!message)
        await queryClient.invalidateQueries({ queryKey: dyeLogQueryOptions(sessionId).queryKey });
      return !message;
    },
    [socket, sessionId, queryClient],
  );

  const record = useCallback(
    (potId: string, recipeLineId: string, amount?: number) =>
      settle(potId, () =>
        socket.timeout(ackTimeoutMs).emitWithAck('dyeLog:record', {
          sessionId,
          potId,
          recipeLineId,
          ...(amount === undefined ? {} : { amount }),
        }),
      ),
    [socket, sessionId, settle],
  );

  const correct = useCallback(
    (potId: string, entryId: string, amount: number, reason: string) =>
      settle(potId, () =>
        socket
          .timeout(ackTimeoutMs)
          .emitWithAck('dyeLog:correct', { sessionId, entryId, amount, reason }),
      ),
    [socket, sessionId, settle],
  );

  return { log, refusals, record, correct };
}
