import { useSyncExternalStore } from 'react';
import { deviceTimeZone } from '@vatside/ui/account/time-zones.ts';

/**
 * The zone a page's first HTML is written in. The server cannot know the phone's zone, so the
 * first HTML and the render that takes it over both read UTC; the phone's own zone follows at once.
 */
export const FIRST_HTML_TIME_ZONE = 'UTC';

const unchanging = () => () => undefined;

/** This device's time zone, UTC while the server's first HTML is being taken over. */
export function useDeviceTimeZone(): string {
  return useSyncExternalStore(unchanging, deviceTimeZone, () => FIRST_HTML_TIME_ZONE);
}
