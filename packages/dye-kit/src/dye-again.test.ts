import { describe, expect, it } from 'vitest';
import { recipeFromLog, stockShortfall } from './dye-again.ts';
import { DyeKitError } from './errors.ts';
import { scaleRecipe } from './scale.ts';
import type { Recipe } from './recipe.ts';

// Hand-worked figures. Formulas: dye mass = WOG × DOS ÷ 100 and stock mL = WOG × DOS ÷ stock
// strength (common practice, packages/dye-kit/test-data/README.md); DOS = dye mass ÷ fiber × 100 is the
// same rule turned round.

const teal: Recipe = {
  weightOfGoodsG: 100,
  liquorRatio: 30,
  acid: { acid: 'vinegar', acidStrengthPct: 5 },
  lines: [
    { kind: 'stock', dyeName: 'Blue', stockStrengthPct: 1, depthOfShadePct: 0.8 },
    { kind: 'stock', dyeName: 'Green', stockStrengthPct: 1, depthOfShadePct: 0.3 },
  ],
};

describe('a recipe from the dye log (common practice)', () => {
  it('the reference example turned round: 200 mL of a 1 % stock on 100 g is 2 % DOS', () => {
    // packages/dye-kit/test-data/README.md: 100 g of yarn at 2 % DOS from a 1 % stock takes 200 mL.
    const { recipe, lines } = recipeFromLog(
      {
        planned: { ...teal, lines: [teal.lines[0]!] },
        loggedAmounts: [200],
        fiberWeightDyedG: 100,
      },
      100,
    );
    expect(lines[0]).toEqual({ from: 'actual', depthOfShadePct: 2, amountPer100g: null });
    expect(recipe.lines[0]).toMatchObject({ kind: 'stock', depthOfShadePct: 2 });
  });

  it('three 100 g skeins logged at 252 mL and 84 mL of 1 % stock reach 0.84 % and 0.28 %', () => {
    // 252 mL × 1 % = 2.52 g of dye; 2.52 g ÷ 300 g × 100 = 0.84 %. 84 mL → 0.84 g → 0.28 %.
    // A measured bath of 9 300 mL on 300 g is a 31:1 liquor ratio.
    const { recipe, lines } = recipeFromLog(
      { planned: teal, loggedAmounts: [252, 84], fiberWeightDyedG: 300, bathVolumeMl: 9_300 },
      115,
    );
    expect(lines.map((l) => l.depthOfShadePct)).toEqual([
      expect.closeTo(0.84, 10),
      expect.closeTo(0.28, 10),
    ]);
    expect(recipe.liquorRatio).toBeCloseTo(31, 10);
    expect(recipe.weightOfGoodsG).toBe(115);

    // Two 115 g skeins: 230 g × 0.84 % ÷ 1 % = 193.2 mL and 230 × 0.28 = 64.4 mL; bath 7 130 mL.
    // A 6 L pot filled to 80 % holds 4 800 mL; one skein's bath is 3 565 mL: one skein a batch.
    const scaled = scaleRecipe(recipe, { skeins: 2, potCapacityMl: 6_000 });
    expect(scaled.lines[0]!.amount).toBeCloseTo(193.2, 9);
    expect(scaled.lines[1]!.amount).toBeCloseTo(64.4, 9);
    expect(scaled.bathVolumeMl).toBeCloseTo(7_130, 9);
    expect(scaled.batches).toHaveLength(2);
    expect(scaled.batches[0]!.lines[0]!.amount).toBeCloseTo(96.6, 9);
    expect(scaled.batches[0]!.bathVolumeMl).toBeCloseTo(3_565, 9);
  });

  it('food color is restated per 100 g of the fiber dyed that day', () => {
    // 6.6 mL on 200 g is 3.3 mL per 100 g; one 100 g skein again takes 3.3 mL.
    const planned: Recipe = {
      ...teal,
      lines: [{ kind: 'foodColor', colorName: 'rose', amountPer100g: 3, unit: 'mL' }],
    };
    const { recipe, lines } = recipeFromLog(
      { planned, loggedAmounts: [6.6], fiberWeightDyedG: 200 },
      100,
    );
    expect(lines[0]!.amountPer100g).toBeCloseTo(3.3, 10);
    expect(scaleRecipe(recipe, { skeins: 1 }).lines[0]!.amount).toBeCloseTo(3.3, 10);
    expect(recipe.liquorRatio).toBe(30);
  });

  it('a line with nothing logged keeps the plan and says so', () => {
    const { lines } = recipeFromLog(
      { planned: teal, loggedAmounts: [252, null], fiberWeightDyedG: 300 },
      100,
    );
    expect(lines[1]).toEqual({ from: 'planned', depthOfShadePct: 0.3, amountPer100g: null });
  });

  it('a host acid amount scales with the new skein weight', () => {
    const planned: Recipe = {
      ...teal,
      acid: { acid: 'vinegar', acidStrengthPct: 5, amountMl: 60 },
    };
    const { recipe } = recipeFromLog(
      { planned, loggedAmounts: [240, 90], fiberWeightDyedG: 300 },
      50,
    );
    expect(recipe.acid).toEqual({ acid: 'vinegar', acidStrengthPct: 5, amountMl: 30 });
  });

  it('refuses a log that does not match the recipe lines, or no fiber', () => {
    expect(() =>
      recipeFromLog({ planned: teal, loggedAmounts: [1], fiberWeightDyedG: 300 }, 100),
    ).toThrow(DyeKitError);
    expect(() =>
      recipeFromLog({ planned: teal, loggedAmounts: [1, 1], fiberWeightDyedG: 0 }, 100),
    ).toThrow(DyeKitError);
  });
});

describe('stock to mix first (common practice: % w/v is grams per 100 mL)', () => {
  it('193.2 mL needed with 150 mL on the shelf: mix 43.2 mL of 1 % stock, 0.432 g of powder', () => {
    const short = stockShortfall({ neededMl: 193.2, onShelfMl: 150, stockStrengthPct: 1 });
    expect(short.status).toBe('short');
    expect(short.mixMl).toBeCloseTo(43.2, 9);
    expect(short.mixDyePowderG).toBeCloseTo(0.432, 9);
  });

  it('no jar at all: mix the whole amount; enough on the shelf: nothing', () => {
    expect(stockShortfall({ neededMl: 64.4, onShelfMl: 0, stockStrengthPct: 2 })).toMatchObject({
      status: 'missing',
      mixMl: 64.4,
      mixDyePowderG: expect.closeTo(1.288, 9),
    });
    expect(stockShortfall({ neededMl: 64.4, onShelfMl: 500, stockStrengthPct: 1 })).toEqual({
      status: 'enough',
      mixMl: 0,
      mixDyePowderG: 0,
    });
  });
});
