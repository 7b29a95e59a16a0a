import { describe, expect, it } from 'vitest';
import { timeZoneFromCookie } from './use-device-time-zone.ts';

// Zone names are the IANA time zone database's (tzdb), as Intl knows them.
describe('the time zone a phone sends in its cookie', () => {
  it('is read among other cookies', () => {
    expect(timeZoneFromCookie('a=1; vatside_tz=Pacific%2FAuckland; b=2')).toBe('Pacific/Auckland');
  });

  it('is ignored when absent, unknown, or not a valid escape', () => {
    expect(timeZoneFromCookie(undefined)).toBeNull();
    expect(timeZoneFromCookie('a=1')).toBeNull();
    expect(timeZoneFromCookie('vatside_tz=Atlantis%2FTidewater')).toBeNull();
    expect(timeZoneFromCookie('vatside_tz=%E0%A4%A')).toBeNull();
  });
});
