import { useCallback, useEffect, useRef } from 'react';

/** What the presenter and its notes window tell each other (same browser, same origin). */
export type PresenterMessage =
  { type: 'at'; index: number } | { type: 'go'; index: number } | { type: 'hello' };

/**
 * A BroadcastChannel per recap between the presenter and its notes window: the notes stay on
 * the host's own window, out of a recording of the presenter's tab, and step with it.
 */
export function usePresenterChannel(
  dyeAlongId: string,
  onMessage: (message: PresenterMessage) => void,
) {
  const channel = useRef<BroadcastChannel | null>(null);
  const handler = useRef(onMessage);
  useEffect(() => {
    handler.current = onMessage;
  });
  useEffect(() => {
    if (typeof BroadcastChannel === 'undefined') return;
    const open = new BroadcastChannel(`vatside-recap-${dyeAlongId}`);
    open.onmessage = (e: MessageEvent<PresenterMessage>) => handler.current(e.data);
    channel.current = open;
    return () => {
      open.close();
      channel.current = null;
    };
  }, [dyeAlongId]);
  return useCallback((message: PresenterMessage) => channel.current?.postMessage(message), []);
}
