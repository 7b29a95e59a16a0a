import { describe, expect, it } from 'vitest';
import { COLORANTS, colorantById } from './colorants.ts';

describe('certified food colors (FDA 21 CFR Part 74 Subpart A; EU numbers from Reg. (EC) 1333/2008, from memory)', () => {
  it.each([
    ['blue1', 'FD&C Blue No. 1', 'E133'],
    ['blue2', 'FD&C Blue No. 2', 'E132'],
    ['green3', 'FD&C Green No. 3', 'E143'],
    ['red3', 'FD&C Red No. 3', 'E127'],
    ['red40', 'FD&C Red No. 40', 'E129'],
    ['yellow5', 'FD&C Yellow No. 5', 'E102'],
    ['yellow6', 'FD&C Yellow No. 6', 'E110'],
  ])('%s is %s, %s', (id, fdcName, euNumber) => {
    expect(colorantById(id)).toMatchObject({ fdcName, euNumber });
  });

  it('lists exactly the seven, with Red No. 3 no longer listed for food (revoked January 2025, from memory)', () => {
    expect(COLORANTS).toHaveLength(7);
    expect(COLORANTS.filter((c) => !c.listedForFood).map((c) => c.id)).toEqual(['red3']);
    expect(colorantById('red3')?.note).toMatch(/2025/);
    expect(colorantById('red2')).toBeUndefined();
  });

  it('absorption maxima (from memory) put yellows at short and blues at long wavelengths', () => {
    expect(colorantById('yellow5')?.absorptionMaxNm).toBe(427);
    expect(colorantById('blue1')?.absorptionMaxNm).toBe(630);
  });
});
