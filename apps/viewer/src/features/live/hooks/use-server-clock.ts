import {
  estimateClockOffset,
  type ClockEstimate,
  type ClockSample,
} from '@vatside/contracts/clock';
import { useCallback, useEffect, useState } from 'react';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

export type ServerClockOptions = {
  /** Pings sent one after another on each (re)connect and when the page comes back. */
  burst?: number;
  /** Pause between routine pings: phone clocks drift and get corrected by the network. */
  everyMs?: number;
  /** Samples kept; the estimate uses the fastest few of them. */
  keep?: number;
};

export type ServerClock = {
  /** The server's time now, as well as round trips can tell. */
  serverNow: () => number;
  estimate: ClockEstimate | null;
};

/**
 * How far this phone's clock is from the server's, from `clock:ping` round trips (see
 * contracts/clock.ts). Countdowns use `serverNow()` against the timers' absolute end times, so a
 * phone whose clock is minutes off still shows the host's countdown.
 */
export function useServerClock(
  socket: LiveSocket,
  { burst = 4, everyMs = 30_000, keep = 8 }: ServerClockOptions = {},
): ServerClock {
  const [estimate, setEstimate] = useState<ClockEstimate | null>(null);

  useEffect(() => {
    let samples: ClockSample[] = [];
    let stopped = false;
    let bursting = false;

    async function ping() {
      const clientSentAtMs = Date.now();
      try {
        const reply = await socket
          .timeout(ackTimeoutMs)
          .emitWithAck('clock:ping', { clientSentAtMs });
        if (stopped || 'error' in reply) return;
        samples = [
          ...samples,
          { clientSentAtMs, serverAtMs: reply.serverAtMs, clientReceivedAtMs: Date.now() },
        ].slice(-keep);
        setEstimate(estimateClockOffset(samples));
      } catch {
        // No answer in time: the next ping tries again.
      }
    }

    async function pingBurst() {
      if (bursting) return;
      bursting = true;
      for (let i = 0; i < burst && !stopped && socket.connected; i++) await ping();
      bursting = false;
    }

    const onVisible = () => {
      if (document.visibilityState === 'visible' && socket.connected) void pingBurst();
    };
    const onConnect = () => void pingBurst();

    socket.on('connect', onConnect);
    document.addEventListener('visibilitychange', onVisible);
    if (socket.connected) void pingBurst();
    const routine = setInterval(() => {
      if (socket.connected) void ping();
    }, everyMs);
    return () => {
      stopped = true;
      socket.off('connect', onConnect);
      document.removeEventListener('visibilitychange', onVisible);
      clearInterval(routine);
    };
  }, [socket, burst, everyMs, keep]);

  const offsetMs = estimate?.offsetMs ?? 0;
  const serverNow = useCallback(() => Date.now() + offsetMs, [offsetMs]);
  return { serverNow, estimate };
}
