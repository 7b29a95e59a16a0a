import { describe, expect, it } from 'vitest';
import { tidePoolSvg } from './tide-pool-image.ts';
import { tidePoolStart } from './tide-pool.ts';

describe('the demo tide-pool month', () => {
  it('starts on the first Saturday three weeks out, 2 PM on the host’s clock', () => {
    // 2026-12-01 + 21 days = Tuesday 2026-12-22 → Saturday 2026-12-26; Halifax is UTC−4 then.
    expect(tidePoolStart(new Date('2026-12-01T23:00:00Z')).toISOString()).toBe(
      '2026-12-26T18:00:00.000Z',
    );
    // A Saturday exactly three weeks out is kept: 2027-06-05 + 21 = Saturday 2027-06-26 (UTC−3).
    expect(tidePoolStart(new Date('2027-06-05T12:00:00Z')).toISOString()).toBe(
      '2027-06-26T17:00:00.000Z',
    );
  });

  it('draws the same picture every time', () => {
    expect(tidePoolSvg()).toBe(tidePoolSvg());
    expect(tidePoolSvg(1)).not.toBe(tidePoolSvg(2));
  });
});
