// The browser's own Intl does the zone arithmetic: no date library on the phone's first screen.

/** Newer ICU puts a narrow no-break space before AM/PM; a plain space reads and copies the same. */
const plainSpaces = (text: string) => text.replace(/[\u202f\u00a0]/g, ' ');

/** An instant on someone's clock, in parts a phone can set large and small. */
export function clockOf(iso: string, timeZone: string) {
  const instant = new Date(iso);
  const day = new Intl.DateTimeFormat('en-US', {
    timeZone,
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    year: 'numeric',
  }).format(instant);
  const time = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hour: 'numeric',
    minute: '2-digit',
  }).format(instant);
  const zone = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' })
    .formatToParts(instant)
    .find((p) => p.type === 'timeZoneName')?.value;
  return { day: plainSpaces(day), time: plainSpaces(time), zone: zone ?? timeZone };
}
