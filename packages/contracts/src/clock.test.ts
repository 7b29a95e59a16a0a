import { describe, expect, it } from 'vitest';
import { estimateClockOffset, sampleOffsetMs } from './clock.ts';

// Exchanges are simulated: the phone's clock runs `skewMs` behind the server's; each leg of the
// trip takes its own time. Checks follow RFC 5905 §8 (NTP on-wire offset and its error bound).
function exchange(skewMs: number, sentAtServerMs: number, upMs: number, downMs: number) {
  return {
    clientSentAtMs: sentAtServerMs - skewMs,
    serverAtMs: sentAtServerMs + upMs,
    clientReceivedAtMs: sentAtServerMs + upMs + downMs - skewMs,
  };
}

describe('clock offset from round trips (RFC 5905 §8)', () => {
  it('is exact when both legs take the same time', () => {
    expect(sampleOffsetMs(exchange(90_000, 1_000_000, 40, 40))).toBe(90_000);
    expect(sampleOffsetMs(exchange(-5_000, 1_000_000, 250, 250))).toBe(-5_000);
  });

  it('errs by at most half the round trip when the legs differ', () => {
    const s = exchange(42_000, 2_000_000, 10, 190);
    expect(Math.abs(sampleOffsetMs(s) - 42_000)).toBeLessThanOrEqual((10 + 190) / 2);
    expect(sampleOffsetMs(s)).toBe(42_000 - 90); // (up − down) / 2
  });

  it('prefers the fastest exchanges, so one slow outlier does not move the estimate', () => {
    const skew = 120_000;
    const samples = [
      exchange(skew, 0, 30, 30),
      exchange(skew, 1_000, 25, 35),
      exchange(skew, 2_000, 35, 25),
      exchange(skew, 3_000, 2_000, 50), // a stalled uplink on a busy phone
      exchange(skew, 4_000, 400, 900),
    ];
    const estimate = estimateClockOffset(samples);
    expect(estimate?.samplesUsed).toBe(3);
    expect(estimate?.offsetMs).toBe(skew);
    expect(estimate?.uncertaintyMs).toBe(30);
  });

  it('returns null without usable samples and skips broken ones', () => {
    expect(estimateClockOffset([])).toBeNull();
    const broken = { clientSentAtMs: 10, serverAtMs: Number.NaN, clientReceivedAtMs: 20 };
    const backwards = { clientSentAtMs: 30, serverAtMs: 25, clientReceivedAtMs: 20 };
    expect(estimateClockOffset([broken, backwards])).toBeNull();
    expect(estimateClockOffset([broken, exchange(7, 100, 5, 5)])?.offsetMs).toBe(7);
  });
});
