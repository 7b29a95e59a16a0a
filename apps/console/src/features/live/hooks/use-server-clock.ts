import { estimateClockOffset, type ClockSample } from '@vatside/contracts/clock';
import { useCallback, useEffect, useState } from 'react';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

/** Pings sent one after another on each (re)connect; the fastest round trips decide. */
const burst = 4;
/** A laptop's clock drifts and gets corrected by the network: look again now and then. */
const everyMs = 60_000;
const keptSamples = 8;

/**
 * The server's time on this machine, from `clock:ping` round trips (contracts/clock.ts). Timers
 * carry absolute server times, so the host's countdown matches the phones' even when this
 * laptop's clock is off.
 */
export function useServerClock(socket: LiveSocket): () => number {
  const [offsetMs, setOffsetMs] = useState(0);

  useEffect(() => {
    let samples: ClockSample[] = [];
    let stopped = false;

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
        ].slice(-keptSamples);
        const estimate = estimateClockOffset(samples);
        if (estimate) setOffsetMs(estimate.offsetMs);
      } catch {
        // No answer in time: the next ping tries again.
      }
    }

    async function pingBurst() {
      for (let i = 0; i < burst && !stopped && socket.connected; i++) await ping();
    }

    const onConnect = () => void pingBurst();
    socket.on('connect', onConnect);
    if (socket.connected) void pingBurst();
    const routine = setInterval(() => {
      if (socket.connected) void ping();
    }, everyMs);
    return () => {
      stopped = true;
      socket.off('connect', onConnect);
      clearInterval(routine);
    };
  }, [socket]);

  return useCallback(() => Date.now() + offsetMs, [offsetMs]);
}
