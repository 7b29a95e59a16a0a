import { describe, expect, it } from 'vitest';
import { acidFor } from './acid.ts';
import { DyeKitError } from './errors.ts';
import { US_GAL_ML, US_TBSP_ML } from './units.ts';

describe('acid (common practice, from memory: ¼ cup per lb; 15–60 mL per L of bath)', () => {
  it('a one-gallon bath with about 11 tbsp of 5 % vinegar is inside the range', () => {
    const acid = acidFor({ weightOfGoodsG: 100, bathVolumeMl: US_GAL_ML, acid: 'vinegar' });
    const elevenTbspMl = 11 * US_TBSP_ML;
    expect(acid.rangeMl.min).toBeLessThan(elevenTbspMl);
    expect(acid.rangeMl.max).toBeGreaterThan(elevenTbspMl);
    expect(acid.recommendedMl).toBeGreaterThanOrEqual(acid.rangeMl.min);
    expect(acid.recommendedMl).toBeLessThanOrEqual(acid.rangeMl.max);
    expect(acid.rule).toMatch(/60 mL.*450 g/);
    expect(acid.household.us.label).not.toBe('');
    expect(acid.household.metric.system).toBe('metric');
  });

  it('never goes under ¼ cup (60 mL) per pound of fiber, even in a small bath', () => {
    const acid = acidFor({
      weightOfGoodsG: 450,
      bathVolumeMl: 2000,
      acid: 'vinegar',
      acidStrengthPct: 5,
    });
    expect(acid.rangeMl.min).toBeCloseTo(60, 9);
    expect(acid.recommendedMl).toBeGreaterThanOrEqual(60);
  });

  it('4 % vinegar needs a quarter more than 5 %', () => {
    const five = acidFor({
      weightOfGoodsG: 100,
      bathVolumeMl: 3000,
      acid: 'vinegar',
      acidStrengthPct: 5,
    });
    const four = acidFor({
      weightOfGoodsG: 100,
      bathVolumeMl: 3000,
      acid: 'vinegar',
      acidStrengthPct: 4,
    });
    expect(four.recommendedMl).toBeCloseTo(five.recommendedMl * 1.25, 9);
    expect(four.rangeMl.max).toBeCloseTo(five.rangeMl.max * 1.25, 9);
  });

  it('strong cleaning vinegar gets a handling warning', () => {
    const acid = acidFor({
      weightOfGoodsG: 100,
      bathVolumeMl: 3000,
      acid: 'vinegar',
      acidStrengthPct: 30,
    });
    expect(acid.warnings.map((w) => w.code)).toContain('STRONG_VINEGAR');
  });

  it('citric acid: about 1 tbsp of crystals per pound of fiber', () => {
    const acid = acidFor({ weightOfGoodsG: 453.59237, bathVolumeMl: 4000, acid: 'citric' });
    expect(acid.recommendedMl).toBeCloseTo(US_TBSP_ML, 9);
    expect(acid.household.us.label).toBe('1 tbsp');
    expect(acid.acidStrengthPct).toBeNull();
  });
});

describe('acid bad input', () => {
  it('rejects bad amounts, zero strength and unknown acids', () => {
    expect(() => acidFor({ weightOfGoodsG: -1, bathVolumeMl: 3000, acid: 'vinegar' })).toThrow(
      DyeKitError,
    );
    expect(() => acidFor({ weightOfGoodsG: 100, bathVolumeMl: NaN, acid: 'vinegar' })).toThrow(
      DyeKitError,
    );
    expect(() =>
      acidFor({ weightOfGoodsG: 100, bathVolumeMl: 3000, acid: 'vinegar', acidStrengthPct: 0 }),
    ).toThrow(DyeKitError);
    expect(() =>
      acidFor({ weightOfGoodsG: 100, bathVolumeMl: 3000, acid: 'lemon' as 'citric' }),
    ).toThrow(expect.objectContaining({ code: 'INVALID_OPTION' }));
    expect(() =>
      acidFor({ weightOfGoodsG: 100, bathVolumeMl: 3000, acid: 'citric', acidStrengthPct: 5 }),
    ).toThrow(DyeKitError);
  });
});
