import { useQueryClient } from '@tanstack/react-query';
import { liveStateSchema, type HostAction, type LiveState } from '@vatside/contracts/live';
import { useCallback, useEffect, useRef, useState } from 'react';
import { liveStateQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';
import { newerState } from './use-host-session.ts';

/** How long a refusal stays beside its control: long enough to read over a steaming pot. */
export const refusalShownMs = 6_000;

/** A pot's id, or the action type for the session-wide controls (note, delay, end). */
export const actionPlace = (action: HostAction) => ('potId' in action ? action.potId : action.type);

/**
 * Sends the host's actions and keeps each refusal beside the control it came from for a few
 * seconds. A second tap of the same control while the first is on its way is dropped, so a wet
 * double tap never moves a pot two steps.
 */
export function useHostActions(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const [refusals, setRefusals] = useState<Record<string, string>>({});
  const inFlight = useRef(new Set<string>());
  const clearTimers = useRef(new Map<string, ReturnType<typeof setTimeout>>());

  useEffect(() => {
    const timers = clearTimers.current;
    return () => timers.forEach((timer) => clearTimeout(timer));
  }, []);

  const show = useCallback((place: string, message: string | null) => {
    clearTimeout(clearTimers.current.get(place));
    setRefusals(({ [place]: _old, ...rest }) => (message ? { ...rest, [place]: message } : rest));
    if (message)
      clearTimers.current.set(
        place,
        setTimeout(() => show(place, null), refusalShownMs),
      );
  }, []);

  const send = useCallback(
    async (action: HostAction): Promise<boolean> => {
      const place = actionPlace(action);
      const control = `${place}:${action.type}`;
      if (inFlight.current.has(control)) return false;
      if (!socket.connected) {
        show(place, 'Offline: nothing was sent. Try again when the connection is back.');
        return false;
      }
      inFlight.current.add(control);
      try {
        const reply = await socket
          .timeout(ackTimeoutMs)
          .emitWithAck('live:action', { sessionId, action });
        if ('error' in reply) {
          show(place, reply.error.message);
          return false;
        }
        const state = liveStateSchema.parse(reply.state);
        queryClient.setQueryData<LiveState>(liveStateQueryOptions(sessionId).queryKey, (old) =>
          newerState(old, state),
        );
        show(place, null);
        return true;
      } catch {
        show(place, 'The server did not answer in time. Check the pot before trying again.');
        return false;
      } finally {
        inFlight.current.delete(control);
      }
    },
    [socket, sessionId, queryClient, show],
  );

  return { send, refusals };
}
