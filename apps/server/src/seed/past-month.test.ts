import { describe, expect, it } from 'vitest';
import { pastMonthStart } from './past-month.ts';

describe('the demo’s archived month', () => {
  it('starts on the Saturday before two months back, 2 PM on the host’s clock', () => {
    // 2026-12-01 19:00 in Halifax − 2 months = Thursday 2026-10-01 → Saturday 2026-09-26;
    // Halifax keeps daylight time (UTC−3) until November, so 2 PM is 17:00 UTC (worked by hand).
    expect(pastMonthStart(new Date('2026-12-01T23:00:00Z')).toISOString()).toBe(
      '2026-09-26T17:00:00.000Z',
    );
  });
});
