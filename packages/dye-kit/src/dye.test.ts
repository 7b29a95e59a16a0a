import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bathVolumeMl,
  depthOfShade,
  dyeMassG,
  dyeMassInStockG,
  foodColorAmount,
  stockVolumeMl,
} from './dye.ts';
import { DyeKitError } from './errors.ts';

describe('dye amounts (common practice)', () => {
  it('100 g at 2 % DOS takes 2 g of dye, i.e. 200 mL of a 1 % stock', () => {
    expect(dyeMassG({ weightOfGoodsG: 100, depthOfShadePct: 2 })).toBe(2);
    expect(stockVolumeMl({ weightOfGoodsG: 100, depthOfShadePct: 2, stockStrengthPct: 1 })).toBe(
      200,
    );
  });

  it('depth of shade is the inverse of dye mass', () => {
    expect(depthOfShade({ dyeMassG: 2, weightOfGoodsG: 100 })).toBe(2);
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        (weightOfGoodsG, depthOfShadePct) => {
          const mass = dyeMassG({ weightOfGoodsG, depthOfShadePct });
          expect(depthOfShade({ dyeMassG: mass, weightOfGoodsG })).toBeCloseTo(depthOfShadePct, 9);
        },
      ),
    );
  });

  it('a stock holds strength × volume ÷ 100 grams of dye (% w/v)', () => {
    expect(dyeMassInStockG({ stockStrengthPct: 1, volumeMl: 250 })).toBe(2.5);
  });

  it('bath volume follows the liquor ratio: 100 g at 30:1 is 3 L', () => {
    expect(bathVolumeMl({ weightOfGoodsG: 100, liquorRatio: 30 })).toBe(3000);
  });
});

describe('food color per 100 g of dry fiber', () => {
  it('scales by weight in mL, drops (approximate) and grams of gel', () => {
    expect(foodColorAmount({ amountPer100g: 2, unit: 'mL', weightOfGoodsG: 50 })).toEqual({
      amount: 1,
      unit: 'mL',
      volumeMl: 1,
      approximate: false,
    });
    // USP <1101>: about 20 drops per mL (from memory).
    expect(foodColorAmount({ amountPer100g: 40, unit: 'drop', weightOfGoodsG: 150 })).toEqual({
      amount: 60,
      unit: 'drop',
      volumeMl: 3,
      approximate: true,
    });
    expect(
      foodColorAmount({ amountPer100g: 40, unit: 'drop', weightOfGoodsG: 100, dropsPerMl: 25 })
        .volumeMl,
    ).toBe(1.6);
    expect(
      foodColorAmount({ amountPer100g: 0.5, unit: 'gGel', weightOfGoodsG: 200 }).volumeMl,
    ).toBeNull();
  });
});

describe('dye bad input', () => {
  it.each([NaN, Infinity, -100, 0])('rejects weight of goods %f', (weightOfGoodsG) => {
    expect(() => dyeMassG({ weightOfGoodsG, depthOfShadePct: 2 })).toThrow(DyeKitError);
  });

  it('rejects zero stock strength, strengths over 100 % and negative depth of shade', () => {
    expect(() =>
      stockVolumeMl({ weightOfGoodsG: 100, depthOfShadePct: 2, stockStrengthPct: 0 }),
    ).toThrow(expect.objectContaining({ code: 'INVALID_AMOUNT', field: 'stockStrengthPct' }));
    expect(() =>
      stockVolumeMl({ weightOfGoodsG: 100, depthOfShadePct: 2, stockStrengthPct: 120 }),
    ).toThrow(DyeKitError);
    expect(() => dyeMassG({ weightOfGoodsG: 100, depthOfShadePct: -1 })).toThrow(DyeKitError);
    expect(() => depthOfShade({ dyeMassG: NaN, weightOfGoodsG: 100 })).toThrow(DyeKitError);
    expect(() => bathVolumeMl({ weightOfGoodsG: 100, liquorRatio: 0 })).toThrow(DyeKitError);
  });

  it('rejects unknown food color units and zero drops per mL', () => {
    expect(() =>
      foodColorAmount({ amountPer100g: 1, unit: 'dash' as 'mL', weightOfGoodsG: 100 }),
    ).toThrow(expect.objectContaining({ code: 'UNKNOWN_UNIT' }));
    expect(() =>
      foodColorAmount({ amountPer100g: 1, unit: 'drop', weightOfGoodsG: 100, dropsPerMl: 0 }),
    ).toThrow(DyeKitError);
  });
});
