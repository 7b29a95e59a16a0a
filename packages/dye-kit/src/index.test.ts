import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as dyeKit from './index.ts';
import type { Recipe } from './index.ts';

/** Every number anywhere in a result, to check that none is NaN or infinite. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (value !== null && typeof value === 'object') return Object.values(value).flatMap(numbersIn);
  return [];
}

const recipe: fc.Arbitrary<Recipe> = fc.record({
  weightOfGoodsG: fc.double({ min: 1, max: 2000, noNaN: true }),
  liquorRatio: fc.double({ min: 2, max: 60, noNaN: true }),
  acid: fc.oneof(
    fc.record({
      acid: fc.constant('vinegar' as const),
      acidStrengthPct: fc.double({ min: 1, max: 30, noNaN: true }),
    }),
    fc.record({ acid: fc.constant('citric' as const) }),
  ),
  lines: fc.array(
    fc.oneof(
      fc.record({
        kind: fc.constant('stock' as const),
        dyeName: fc.constantFrom('scarlet', 'navy', 'gold'),
        stockStrengthPct: fc.double({ min: 0.01, max: 10, noNaN: true }),
        depthOfShadePct: fc.double({ min: 0, max: 8, noNaN: true }),
      }),
      fc.record({
        kind: fc.constant('foodColor' as const),
        colorName: fc.constantFrom('leaf green', 'sky blue', 'cherry'),
        amountPer100g: fc.double({ min: 0, max: 100, noNaN: true }),
        unit: fc.constantFrom('mL' as const, 'drop' as const, 'gGel' as const),
      }),
    ),
    { maxLength: 4 },
  ),
});

describe('public API', () => {
  it('exports the names other packages call', () => {
    for (const name of [
      'convert',
      'toHouseholdMeasure',
      'celsiusToFahrenheit',
      'fahrenheitToCelsius',
      'dyeMassG',
      'stockVolumeMl',
      'depthOfShade',
      'acidFor',
      'bathVolumeMl',
      'scaleRecipe',
      'lastDrop',
      'fiberCheck',
      'recipeWarnings',
      'hexToLab',
      'labToHex',
      'deltaE2000',
      'ksFromReflectance',
      'reflectanceFromKs',
      'extractPalette',
      'paletteCloseness',
      'describeColor',
      'DyeKitError',
    ]) {
      expect(typeof (dyeKit as Record<string, unknown>)[name], name).toBe('function');
    }
    expect(dyeKit.COLORANTS.length).toBe(7);
  });

  it('no result contains NaN or Infinity (fast-check over scaling and warnings)', () => {
    fc.assert(
      fc.property(
        recipe,
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.option(fc.double({ min: 500, max: 40000, noNaN: true }), { nil: undefined }),
        fc.constantFrom('us' as const, 'metric' as const),
        (r, weightOfGoodsG, potCapacityMl, system) => {
          const scaled = dyeKit.scaleRecipe(r, {
            weightOfGoodsG,
            system,
            ...(potCapacityMl ? { potCapacityMl } : {}),
          });
          const warnings = dyeKit.recipeWarnings(r, { weightOfGoodsG, system });
          for (const n of numbersIn([scaled, warnings])) expect(Number.isFinite(n)).toBe(true);
        },
      ),
      { numRuns: 150 },
    );
  });

  it('no NaN from leftovers either', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            stockStrengthPct: fc.double({ min: 0.001, max: 10, noNaN: true }),
            volumeMl: fc.double({ min: 0.1, max: 2000, noNaN: true }),
            color: fc.constantFrom('#000000', '#ffffff', '#d0202a', '#1f5fbf'),
          }),
          { minLength: 1, maxLength: 5 },
        ),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (leftovers, weightOfGoodsG) => {
          for (const n of numbersIn(dyeKit.lastDrop({ leftovers, weightOfGoodsG }))) {
            expect(Number.isFinite(n)).toBe(true);
          }
        },
      ),
    );
  });
});
