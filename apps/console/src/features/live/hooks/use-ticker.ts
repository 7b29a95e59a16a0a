import { useEffect, useState } from 'react';

/** Re-renders every `everyMs` with `now()`, so countdowns move on their own. */
export function useTicker(now: () => number, everyMs = 250): number {
  const [tick, setTick] = useState(now);
  useEffect(() => {
    setTick(now());
    const timer = setInterval(() => setTick(now()), everyMs);
    return () => clearInterval(timer);
  }, [now, everyMs]);
  return tick;
}
