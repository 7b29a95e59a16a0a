/**
 * Estimating how far a phone's clock is from the server's, from round trips.
 * Offset of one exchange, as in NTP (Mills et al., RFC 5905 §8):
 *   θ = ((T2 − T1) + (T3 − T4)) / 2, with T1 sent and T4 received on the client,
 *   T2 = T3 the server's time (it answers at once). Its error is at most half the round trip,
 *   so the estimate keeps the exchanges with the shortest round trips.
 */
export interface ClockSample {
  clientSentAtMs: number;
  serverAtMs: number;
  clientReceivedAtMs: number;
}

export interface ClockEstimate {
  /** Add to the client's clock to get the server's. */
  offsetMs: number;
  /** Half the best round trip: the offset is within ± this. */
  uncertaintyMs: number;
  samplesUsed: number;
}

export function sampleOffsetMs(s: ClockSample): number {
  return (s.serverAtMs - s.clientSentAtMs + (s.serverAtMs - s.clientReceivedAtMs)) / 2;
}

export const roundTripMs = (s: ClockSample) => s.clientReceivedAtMs - s.clientSentAtMs;

/** Median offset of the `keep` fastest exchanges; null until there is a usable sample. */
export function estimateClockOffset(
  samples: readonly ClockSample[],
  keep = 3,
): ClockEstimate | null {
  const usable = samples
    .filter(
      (s) =>
        [s.clientSentAtMs, s.serverAtMs, s.clientReceivedAtMs].every(Number.isFinite) &&
        roundTripMs(s) >= 0,
    )
    .sort((a, b) => roundTripMs(a) - roundTripMs(b))
    .slice(0, Math.max(1, keep));
  if (usable.length === 0) return null;
  const offsets = usable.map(sampleOffsetMs).sort((a, b) => a - b);
  const mid = offsets.length >> 1;
  const offsetMs =
    offsets.length % 2
      ? (offsets[mid] as number)
      : ((offsets[mid - 1] as number) + (offsets[mid] as number)) / 2;
  return {
    offsetMs,
    uncertaintyMs: roundTripMs(usable[0] as ClockSample) / 2,
    samplesUsed: usable.length,
  };
}
