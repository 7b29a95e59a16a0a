import { createContext, useContext, useSyncExternalStore } from 'react';
import { deviceTimeZone } from '@vatside/ui/account/time-zones.ts';

// The server cannot see the phone's clock. The phone tells it in a cookie, so a page's first
// HTML shows times in the phone's zone from the second visit on; on the first, it is UTC, and
// the phone's own zone follows as soon as the page is taken over.

/** The cookie that carries the phone's time zone to the server. */
export const TIME_ZONE_COOKIE = 'vatside_tz';

/** The zone the first HTML was written in: the render that takes it over must read the same. */
export const FirstHtmlTimeZone = createContext('UTC');

/**
 * The zone a request's Cookie header names, if this runtime knows it; else null (a cookie can
 * hold anything, including a broken %-escape).
 */
export function timeZoneFromCookie(cookieHeader: string | undefined): string | null {
  const sent = cookieHeader
    ?.split(/;\s*/)
    .find((pair) => pair.startsWith(`${TIME_ZONE_COOKIE}=`))
    ?.slice(TIME_ZONE_COOKIE.length + 1);
  if (!sent) return null;
  try {
    const name = decodeURIComponent(sent);
    return new Intl.DateTimeFormat('en-US', { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

/** Tells the server this phone's zone, for the first HTML of the next page. */
export function rememberTimeZone() {
  const zone = encodeURIComponent(deviceTimeZone());
  if (!document.cookie.split('; ').includes(`${TIME_ZONE_COOKIE}=${zone}`)) {
    document.cookie = `${TIME_ZONE_COOKIE}=${zone}; Path=/; Max-Age=31536000; SameSite=Lax`;
  }
}

const unchanging = () => () => undefined;

/** This device's time zone; while a first HTML is taken over, the zone it was written in. */
export function useDeviceTimeZone(): string {
  const firstHtmlZone = useContext(FirstHtmlTimeZone);
  return useSyncExternalStore(unchanging, deviceTimeZone, () => firstHtmlZone);
}
