import { useEffect, useRef } from 'react';

export type TimerWatch = {
  /** Names one run of one timer, e.g. pot, mode and end time. */
  key: string;
  done: boolean;
};

/**
 * Calls `ring` when a watched timer goes from counting to done while the page is open. A timer
 * first seen already done (joining late) does not ring.
 */
export function useTimerAlarms(watches: readonly TimerWatch[], ring: () => void) {
  const seen = useRef(new Map<string, boolean>());
  useEffect(() => {
    let ended = false;
    for (const { key, done } of watches) {
      if (seen.current.get(key) === false && done) ended = true;
      seen.current.set(key, done);
    }
    if (ended) ring();
  });
}
