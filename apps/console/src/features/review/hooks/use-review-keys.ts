import { useEffect, useLayoutEffect, useRef } from 'react';
import { reviewKey, type ReviewKey } from '../keys.ts';

/** Typing places and dialogs keep their keys. */
const ownsKeys = 'input, textarea, select, [contenteditable="true"], [role="dialog"]';

/** The queue's keys (keys.ts), listened for on the whole page; a held-down key counts once. */
export function useReviewKeys(onKey: (key: ReviewKey) => void, enabled: boolean) {
  const latest = useRef(onKey);
  useLayoutEffect(() => {
    latest.current = onKey;
  });
  useEffect(() => {
    if (!enabled) return;
    function onKeyDown(event: KeyboardEvent) {
      if (event.defaultPrevented || event.repeat) return;
      const target = event.target instanceof Element ? event.target : null;
      // A checkbox keeps Space; x, j, k and the rest still work while it has focus.
      if (
        target?.closest(ownsKeys) &&
        !(target instanceof HTMLInputElement && target.type === 'checkbox')
      )
        return;
      const key = reviewKey(event);
      if (!key) return;
      event.preventDefault();
      latest.current(key);
    }
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [enabled]);
}
