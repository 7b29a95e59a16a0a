import { tz } from '@date-fns/tz';
import { format } from 'date-fns';

/** The zone's short name at that instant, e.g. "AST" or "GMT+9". */
function zoneAbbreviation(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' }).formatToParts(
    instant,
  );
  return parts.find((p) => p.type === 'timeZoneName')?.value ?? timeZone;
}

/** An instant on someone's clock, in parts a phone can set large and small. */
export function clockOf(iso: string, timeZone: string) {
  const instant = new Date(iso);
  const on = { in: tz(timeZone) };
  return {
    day: format(instant, 'EEEE, MMMM d, yyyy', on),
    time: format(instant, 'h:mm a', on),
    zone: zoneAbbreviation(instant, timeZone),
  };
}
