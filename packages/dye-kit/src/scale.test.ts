import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DyeKitError } from './errors.ts';
import type { Recipe } from './recipe.ts';
import { scaleRecipe, type BathAmounts } from './scale.ts';

const hostRecipe: Recipe = {
  weightOfGoodsG: 100,
  liquorRatio: 30,
  acid: { acid: 'vinegar', acidStrengthPct: 5, amountMl: 160 },
  lines: [
    { kind: 'stock', dyeName: 'turquoise', stockStrengthPct: 1, depthOfShadePct: 2 },
    { kind: 'foodColor', colorName: 'lemon yellow', amountPer100g: 40, unit: 'drop' },
    { kind: 'foodColor', colorName: 'rose gel', amountPer100g: 0.5, unit: 'gGel' },
  ],
};

function amounts(bath: BathAmounts): number[] {
  return [bath.bathVolumeMl, bath.acid.amountMl, ...bath.lines.map((l) => l.amount)];
}

describe('scaleRecipe (common practice: every line scales with the dry weight)', () => {
  it("scales every line, the acid and the water to a viewer's 50 g skein", () => {
    const scaled = scaleRecipe(hostRecipe, { weightOfGoodsG: 50 });
    expect(scaled.scaleFactor).toBe(0.5);
    expect(scaled.bathVolumeMl).toBe(1500);
    expect(scaled.acid).toMatchObject({ amountMl: 80, source: 'recipe' });
    expect(scaled.lines.map((l) => [l.amount, l.unit])).toEqual([
      [100, 'mL'],
      [20, 'drop'],
      [0.25, 'gGel'],
    ]);
    expect(scaled.lines[0]!.dyeMassG).toBe(1);
    expect(scaled.batches).toHaveLength(1);
    expect(scaled.recipe.weightOfGoodsG).toBe(50);
  });

  it('uses the acid rule when the host gave no amount', () => {
    const scaled = scaleRecipe({ ...hostRecipe, acid: { acid: 'citric' } }, { skeins: 1 });
    expect(scaled.acid.source).toBe('rule');
    expect(scaled.acid.amountMl).toBeGreaterThan(0);
  });

  it('splits into batches that keep the liquor ratio when the pot would overflow', () => {
    // 5 skeins at 30:1 need 15 L; a 8 L pot holds 6.4 L with room to simmer: 2 skeins a batch.
    const scaled = scaleRecipe(hostRecipe, { skeins: 5, potCapacityMl: 8000 });
    expect(scaled.batches.map((b) => b.skeins)).toEqual([2, 2, 1]);
    for (const batch of scaled.batches) {
      expect(batch.bathVolumeMl / batch.weightOfGoodsG).toBe(30);
      expect(batch.lines[0]!.amount).toBe(batch.weightOfGoodsG * 2);
    }
    expect(scaled.warnings.map((w) => w.code)).toContain('SPLIT_INTO_BATCHES');
    const byWeight = scaleRecipe(hostRecipe, { weightOfGoodsG: 450, potCapacityMl: 8000 });
    expect(byWeight.batches).toHaveLength(3);
    expect(byWeight.batches.reduce((sum, b) => sum + b.weightOfGoodsG, 0)).toBeCloseTo(450, 9);
  });

  it('says so when a single skein does not fit the pot', () => {
    const scaled = scaleRecipe(hostRecipe, { skeins: 2, potCapacityMl: 2000 });
    expect(scaled.warnings.find((w) => w.code === 'POT_TOO_SMALL')?.severity).toBe('critical');
  });

  it('warns when an amount is too small to measure and suggests a 1:10 stock', () => {
    const pale: Recipe = {
      ...hostRecipe,
      lines: [{ kind: 'stock', dyeName: 'black', stockStrengthPct: 1, depthOfShadePct: 0.01 }],
    };
    const scaled = scaleRecipe(pale, { weightOfGoodsG: 50 });
    const warning = scaled.warnings.find((w) => w.code === 'AMOUNT_TOO_SMALL');
    expect(warning?.lineIndex).toBe(0);
    expect(warning?.message).toContain('1:10');
    expect(warning?.message).toContain('0.1 % stock');
  });

  it('gives drop and gel dilutions a home dyer can follow', () => {
    const tiny: Recipe = {
      ...hostRecipe,
      lines: [
        { kind: 'foodColor', colorName: 'sky blue', amountPer100g: 0.2, unit: 'drop' },
        { kind: 'foodColor', colorName: 'rose gel', amountPer100g: 0.02, unit: 'gGel' },
      ],
    };
    const messages = scaleRecipe(tiny, { weightOfGoodsG: 50 }).warnings.map((w) => w.message);
    // 0.1 drop: one drop in 1 tbsp of water, then 0.1 × 1 tbsp ≈ ¼ tsp of the mix.
    expect(messages[0]).toContain('Stir 1 drop of the color into 1 tbsp of water and use ¼ tsp');
    expect(messages[1]).toMatch(/Dissolve 1 g of the gel in hot water to make \d+ mL/);
  });

  it('warns when rounding to spoons or whole drops changes the result noticeably', () => {
    const scaled = scaleRecipe(hostRecipe, { weightOfGoodsG: 3.5 });
    // 1.4 drops rounds to 1 drop (−29 %).
    expect(
      scaled.warnings.some((w) => w.code === 'ROUNDING_CHANGES_RESULT' && w.lineIndex === 1),
    ).toBe(true);
    const exact = scaleRecipe(hostRecipe, { weightOfGoodsG: 100 });
    expect(exact.warnings.filter((w) => w.code === 'ROUNDING_CHANGES_RESULT')).toEqual([]);
  });

  it('scale by k then by 1/k returns the recipe (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 40, noNaN: true }), (k) => {
        const up = scaleRecipe(hostRecipe, { weightOfGoodsG: hostRecipe.weightOfGoodsG * k });
        const back = scaleRecipe(up.recipe, { weightOfGoodsG: hostRecipe.weightOfGoodsG });
        const original = scaleRecipe(hostRecipe, { weightOfGoodsG: hostRecipe.weightOfGoodsG });
        amounts(back).forEach((value, i) => {
          expect(value).toBeCloseTo(amounts(original)[i]!, 9);
        });
        expect(back.recipe.acid).toEqual({ ...hostRecipe.acid, amountMl: expect.closeTo(160, 9) });
        amounts(up).forEach((value, i) => {
          expect(value).toBeCloseTo(amounts(original)[i]! * k, 6);
        });
      }),
    );
  });
});

describe('scaleRecipe bad input', () => {
  it('rejects bad targets and broken recipes', () => {
    expect(() => scaleRecipe(hostRecipe, { weightOfGoodsG: -50 })).toThrow(DyeKitError);
    expect(() => scaleRecipe(hostRecipe, { weightOfGoodsG: NaN })).toThrow(DyeKitError);
    expect(() => scaleRecipe(hostRecipe, { skeins: 1.5 })).toThrow(DyeKitError);
    expect(() => scaleRecipe(hostRecipe, { skeins: 2, potCapacityMl: 0 })).toThrow(DyeKitError);
    expect(() =>
      scaleRecipe(
        {
          ...hostRecipe,
          lines: [{ kind: 'stock', dyeName: 'x', stockStrengthPct: 0, depthOfShadePct: 1 }],
        },
        { skeins: 1 },
      ),
    ).toThrow(expect.objectContaining({ code: 'INVALID_AMOUNT' }));
    expect(() => scaleRecipe({ ...hostRecipe, liquorRatio: Infinity }, { skeins: 1 })).toThrow(
      DyeKitError,
    );
    expect(() =>
      scaleRecipe({ ...hostRecipe, lines: [{ kind: 'powder' } as never] }, { skeins: 1 }),
    ).toThrow(expect.objectContaining({ code: 'INVALID_RECIPE' }));
  });
});
