import { TZDate, tz } from '@date-fns/tz';
import { format } from 'date-fns';

// The host plans on a wall clock in one zone; the server stores instants. These turn one into
// the other for the form, with date-fns and its time-zone add-on.

const LOCAL = "yyyy-MM-dd'T'HH:mm";
export const localPattern = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** "2026-12-12T14:00" read in `timeZone` → the instant (an ISO string with offset Z). */
export function localToIso(local: string, timeZone: string): string {
  const [y, mo, d, h, mi] = local.split(/[-T:]/).map(Number) as [
    number,
    number,
    number,
    number,
    number,
  ];
  return new TZDate(y, mo - 1, d, h, mi, timeZone).toISOString();
}

/** An instant as the wall clock in `timeZone` shows it, for a datetime-local input. */
export const isoToLocal = (iso: string, timeZone: string) =>
  format(new Date(iso), LOCAL, { in: tz(timeZone) });

/** Whether the wall-clock time exists in that zone (a spring-forward gap skips an hour). */
export const existsIn = (local: string, timeZone: string) =>
  isoToLocal(localToIso(local, timeZone), timeZone) === local;

/** "Sat, Dec 12, 2026, 2:00 PM" on the clock of `timeZone`. */
export const clockLabel = (iso: string, timeZone: string) =>
  format(new Date(iso), 'EEE, MMM d, yyyy, h:mm a', { in: tz(timeZone) });

/** This month ("2026-12") on the calendar of `timeZone`. */
export const monthIn = (timeZone: string, now = new Date()) =>
  format(now, 'yyyy-MM', { in: tz(timeZone) });
