import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DyeKitError } from './errors.ts';
import { smallestMeasureMl, toHouseholdMeasure } from './household.ts';
import { US_CUP_ML, US_TBSP_ML, US_TSP_ML } from './units.ts';

describe('toHouseholdMeasure, US customary spoons (NIST values)', () => {
  it('2 tbsp + 1 ½ tsp is exact for its own volume', () => {
    const measure = toHouseholdMeasure(2 * US_TBSP_ML + 1.5 * US_TSP_ML, { system: 'us' });
    expect(measure.label).toBe('2 tbsp + 1 ½ tsp');
    expect(measure.roundingErrorMl).toBeCloseTo(0, 9);
    expect(measure.parts).toEqual([
      { unit: 'tbsp', amount: 2, label: '2 tbsp' },
      { unit: 'tsp', amount: 1.5, label: '1 ½ tsp' },
    ]);
  });

  it('prefers one cup measure to a pile of spoons (¼ cup, not 4 tbsp)', () => {
    expect(toHouseholdMeasure(4 * US_TBSP_ML, { system: 'us' }).label).toBe('¼ cup');
    expect(toHouseholdMeasure((3 / 4) * US_CUP_ML + US_TBSP_ML, { system: 'us' }).label).toBe(
      '¾ cup + 1 tbsp',
    );
    expect(toHouseholdMeasure(US_CUP_ML, { system: 'us' }).label).toBe('1 cup');
  });

  it('11 tbsp (33 tsp) of vinegar reads as ⅔ cup (32 tsp) + 1 tsp, exactly', () => {
    const measure = toHouseholdMeasure(11 * US_TBSP_ML, { system: 'us' });
    expect(measure.label).toBe('⅔ cup + 1 tsp');
    expect(measure.roundingErrorMl).toBeCloseTo(0, 9);
  });

  it('rounds to ⅛ tsp and reports the error it introduces', () => {
    const measure = toHouseholdMeasure(1, { system: 'us' });
    expect(measure.label).toBe('¼ tsp');
    expect(measure.measuredMl).toBeCloseTo(US_TSP_ML / 4, 12);
    expect(measure.roundingErrorMl).toBeCloseTo(US_TSP_ML / 4 - 1, 12);
    expect(measure.roundingErrorPct).toBeCloseTo((US_TSP_ML / 4 - 1) * 100, 9);
  });

  it('says when an amount is under the smallest spoon', () => {
    const measure = toHouseholdMeasure(0.2, { system: 'us' });
    expect(measure.tooSmallToMeasure).toBe(true);
    expect(measure.label).toBe('less than ⅛ tsp');
    expect(smallestMeasureMl('us')).toBe(US_TSP_ML / 8);
    expect(toHouseholdMeasure(0, { system: 'us' })).toMatchObject({
      label: 'none',
      roundingErrorPct: 0,
    });
  });

  it('large amounts go to the nearest cup fraction', () => {
    expect(toHouseholdMeasure(16 * US_CUP_ML, { system: 'us' }).label).toBe('16 cups');
    expect(toHouseholdMeasure(4.3 * US_CUP_ML, { system: 'us' }).label).toBe('4 ⅓ cups');
  });
});

describe('toHouseholdMeasure, metric spoons (5 / 15 / 250 mL)', () => {
  it('uses metric measures', () => {
    expect(toHouseholdMeasure(250, { system: 'metric' }).label).toBe('1 cup');
    expect(toHouseholdMeasure(20, { system: 'metric' }).label).toBe('1 tbsp + 1 tsp');
    expect(toHouseholdMeasure(2.5, { system: 'metric' }).label).toBe('½ tsp');
    expect(toHouseholdMeasure(500, { system: 'metric' }).roundingErrorMl).toBe(0);
  });
});

describe('toHouseholdMeasure properties (fast-check)', () => {
  it('the error stays within half of ⅛ tsp below 4 cups, and parts add up to the measure', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 900, noNaN: true }),
        fc.constantFrom('us' as const, 'metric' as const),
        (ml, system) => {
          const measure = toHouseholdMeasure(ml, { system });
          expect(Math.abs(measure.roundingErrorMl)).toBeLessThanOrEqual(
            smallestMeasureMl(system) / 2 + 1e-9,
          );
          const spoons =
            system === 'us'
              ? { cup: US_CUP_ML, tbsp: US_TBSP_ML, tsp: US_TSP_ML }
              : { cup: 250, tbsp: 15, tsp: 5 };
          const sum = measure.parts.reduce(
            (total, part) => total + part.amount * spoons[part.unit],
            0,
          );
          expect(sum).toBeCloseTo(measure.measuredMl, 9);
          expect(Number.isNaN(measure.roundingErrorPct)).toBe(false);
        },
      ),
    );
  });
});

describe('toHouseholdMeasure bad input', () => {
  it.each([NaN, Infinity, -5])('rejects %f', (ml) => {
    expect(() => toHouseholdMeasure(ml, { system: 'us' })).toThrow(DyeKitError);
  });

  it('rejects an unknown system', () => {
    expect(() => toHouseholdMeasure(5, { system: 'imperial' as 'us' })).toThrow(
      expect.objectContaining({ code: 'INVALID_OPTION' }),
    );
  });
});
