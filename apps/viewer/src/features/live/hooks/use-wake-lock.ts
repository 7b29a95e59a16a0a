import { useEffect, useState, useSyncExternalStore } from 'react';

export type WakeLockStatus = 'on' | 'off' | 'unsupported';

const supported = () => window.isSecureContext && 'wakeLock' in navigator;
const unchanging = () => () => undefined;

/**
 * Keeps the screen on while `active` (Screen Wake Lock API). The browser drops the lock when the
 * page is hidden, so it is taken again each time the page becomes visible. Needs a secure
 * context: https, localhost or 127.0.0.1.
 */
export function useWakeLock(active: boolean): WakeLockStatus {
  // Unknown to the server's first HTML (and the render that takes it over): "unsupported" until
  // the phone itself is asked.
  const canLock = useSyncExternalStore(unchanging, supported, () => false);
  const [status, setStatus] = useState<WakeLockStatus>('off');

  useEffect(() => {
    if (!active || !supported()) return;
    let lock: WakeLockSentinel | null = null;
    let stopped = false;

    async function take() {
      if (document.visibilityState !== 'visible' || (lock && !lock.released)) return;
      try {
        const taken = await navigator.wakeLock.request('screen');
        if (stopped) {
          void taken.release();
          return;
        }
        lock = taken;
        setStatus('on');
        taken.addEventListener('release', () => {
          if (!stopped) setStatus('off');
        });
      } catch {
        // Refused, e.g. in battery saver: the screen may dim, and the status line says so.
        setStatus('off');
      }
    }

    const onVisibility = () => void take();
    document.addEventListener('visibilitychange', onVisibility);
    void take();
    return () => {
      stopped = true;
      document.removeEventListener('visibilitychange', onVisibility);
      void lock?.release();
    };
  }, [active]);

  return canLock ? status : 'unsupported';
}
