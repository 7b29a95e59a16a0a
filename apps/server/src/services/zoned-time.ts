import { TZDate, tz } from '@date-fns/tz';
import { format } from 'date-fns';
import type { ZonedTime } from '@vatside/contracts/dye-alongs';
import { HttpError } from '../http/errors.ts';

// Instants shown on someone's own clock, and a host's wall-clock time turned into an instant.

const LOCAL_FORMAT = "yyyy-MM-dd'T'HH:mm";

/** "2026-12-12T14:00" in `timeZone` → the instant; refuses times a clock change skips. */
export function instantFromLocal(local: string, timeZone: string, field = 'startsAtLocal'): Date {
  const [date = '', time = ''] = local.split('T');
  const [y, mo, d] = date.split('-').map(Number);
  const [h, mi] = time.split(':').map(Number);
  const zoned = new TZDate(y!, mo! - 1, d!, h!, mi!, timeZone);
  // A wall-clock time in a spring-forward gap does not exist; TZDate moves it an hour on.
  if (Number.isNaN(zoned.getTime()) || format(zoned, LOCAL_FORMAT) !== local) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'That time does not exist on that day.', {
      [field]: [
        `${local} does not exist in ${timeZone} (the clocks change then); pick another time.`,
      ],
    });
  }
  return new Date(zoned.getTime());
}

/** The zone's short name at that instant, e.g. "AST" or "GMT+1". */
function zoneAbbreviation(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' }).formatToParts(
    instant,
  );
  return parts.find((p) => p.type === 'timeZoneName')?.value ?? timeZone;
}

/** An instant on a clock: "Saturday, December 12, 2026 at 2:00 PM AST (America/Halifax)". */
export function zonedTime(instant: Date, timeZone: string): ZonedTime {
  const on = { in: tz(timeZone) };
  return {
    timeZone,
    local: format(instant, LOCAL_FORMAT, on),
    label: `${format(instant, "EEEE, MMMM d, yyyy 'at' h:mm a", on)} ${zoneAbbreviation(instant, timeZone)} (${timeZone})`,
  };
}
