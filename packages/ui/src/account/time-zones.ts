/** The device's own zone, sent at sign-up and offered on the profile. */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

/** Every zone the browser knows, with `current` kept even if the list lacks it (e.g. "UTC"). */
export function timeZoneChoices(current: string): string[] {
  const zones = Intl.supportedValuesOf('timeZone');
  return zones.includes(current) ? zones : [current, ...zones];
}
