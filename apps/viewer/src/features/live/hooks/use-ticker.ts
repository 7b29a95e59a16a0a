import { useEffect, useState } from 'react';

/** Re-renders about four times a second while `active`, so countdowns never lag a second. */
export function useTicker(active: boolean, everyMs = 250): void {
  const [, setTick] = useState(0);
  useEffect(() => {
    if (!active) return;
    const id = setInterval(() => setTick((n) => n + 1), everyMs);
    return () => clearInterval(id);
  }, [active, everyMs]);
}
