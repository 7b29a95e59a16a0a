import { describe, expect, it } from 'vitest';
import { DyeKitError } from './errors.ts';
import type { Recipe } from './recipe.ts';
import { recipeWarnings } from './warnings.ts';

const base: Recipe = {
  weightOfGoodsG: 100,
  liquorRatio: 30,
  acid: { acid: 'vinegar', acidStrengthPct: 5 },
  lines: [{ kind: 'stock', dyeName: 'scarlet', stockStrengthPct: 1, depthOfShadePct: 2 }],
};

function codes(recipe: Recipe, context = {}) {
  return recipeWarnings(recipe, context).map((w) => w.code);
}

describe('recipeWarnings: what goes wrong in real pots (common practice)', () => {
  it('a plain 2 % recipe in a stainless pot at a simmer raises nothing', () => {
    expect(
      codes(base, { potMaterial: 'stainlessSteel', heat: 'simmer', hasThermometer: true }),
    ).toEqual([]);
  });

  it('depth of shade over about 4 % will not exhaust', () => {
    const deep: Recipe = {
      ...base,
      lines: [
        { kind: 'stock', dyeName: 'scarlet', stockStrengthPct: 1, depthOfShadePct: 3 },
        { kind: 'stock', dyeName: 'gold', stockStrengthPct: 1, depthOfShadePct: 2 },
      ],
    };
    expect(codes(deep)).toContain('DEPTH_OF_SHADE_HIGH');
    expect(codes(base)).not.toContain('DEPTH_OF_SHADE_HIGH');
  });

  it('greens, purples and blacks may break, by name or by the colorants on the label', () => {
    const green: Recipe = {
      ...base,
      lines: [{ kind: 'foodColor', colorName: 'leaf green', amountPer100g: 2, unit: 'mL' }],
    };
    expect(recipeWarnings(green).find((w) => w.code === 'COLOR_MAY_BREAK')?.lineIndex).toBe(0);
    const labeled: Recipe = {
      ...base,
      lines: [
        {
          kind: 'foodColor',
          colorName: 'mystery',
          amountPer100g: 2,
          unit: 'mL',
          colorants: ['blue1', 'red40'],
        },
      ],
    };
    expect(codes(labeled)).toContain('COLOR_MAY_BREAK');
    const acrossLines: Recipe = {
      ...base,
      lines: [
        {
          kind: 'foodColor',
          colorName: 'lemon',
          amountPer100g: 2,
          unit: 'mL',
          colorants: ['yellow5'],
        },
        { kind: 'foodColor', colorName: 'sky', amountPer100g: 2, unit: 'mL', colorants: ['blue1'] },
      ],
    };
    expect(codes(acrossLines)).toContain('COLOR_MAY_BREAK');
    expect(codes(base)).not.toContain('COLOR_MAY_BREAK');
  });

  it('blue food color exhausts slowly', () => {
    const blue: Recipe = {
      ...base,
      lines: [{ kind: 'foodColor', colorName: 'royal blue gel', amountPer100g: 0.5, unit: 'gGel' }],
    };
    expect(codes(blue)).toContain('BLUE_EXHAUSTS_SLOWLY');
    const red: Recipe = {
      ...base,
      lines: [
        {
          kind: 'foodColor',
          colorName: 'cherry',
          amountPer100g: 2,
          unit: 'mL',
          colorants: ['red40'],
        },
      ],
    };
    expect(codes(red)).not.toContain('BLUE_EXHAUSTS_SLOWLY');
  });

  it("amounts too small at the viewer's skein size", () => {
    const pale: Recipe = {
      ...base,
      lines: [{ kind: 'stock', dyeName: 'scarlet', stockStrengthPct: 1, depthOfShadePct: 0.02 }],
    };
    expect(codes(pale)).not.toContain('AMOUNT_TOO_SMALL');
    expect(codes(pale, { weightOfGoodsG: 20 })).toContain('AMOUNT_TOO_SMALL');
  });

  it('aluminum pots, boiling, and simmer cues for people without a thermometer', () => {
    expect(codes(base, { potMaterial: 'aluminum' })).toContain('ALUMINUM_POT');
    const boiling = recipeWarnings(base, { heat: 'boil' }).find((w) => w.code === 'BOILING');
    expect(boiling?.message).toMatch(/85–95 °C \(185–203 °F\)/);
    expect(codes(base, { maxTempC: 100 })).toContain('BOILING');
    expect(codes(base, { hasThermometer: false })).toEqual(['SIMMER_CUES']);
  });

  it('pot capacity and fiber content add their warnings', () => {
    expect(codes(base, { weightOfGoodsG: 400, potCapacityMl: 8000 })).toContain(
      'SPLIT_INTO_BATCHES',
    );
    expect(codes(base, { fiberContent: [{ fiber: 'wool', pct: 100 }], superwash: true })).toContain(
      'SUPERWASH_STRIKES_FAST',
    );
  });

  it('every warning has a stable code, a severity and a message', () => {
    const all = recipeWarnings(
      {
        ...base,
        lines: [{ kind: 'foodColor', colorName: 'navy', amountPer100g: 0.01, unit: 'drop' }],
      },
      { potMaterial: 'aluminum', heat: 'boil', fiberContent: [{ fiber: 'wool', pct: 100 }] },
    );
    expect(all.length).toBeGreaterThan(3);
    for (const warning of all) {
      expect(warning.code).toMatch(/^[A-Z_]+$/);
      expect(['info', 'warning', 'critical']).toContain(warning.severity);
      expect(warning.message.length).toBeGreaterThan(20);
    }
  });
});

describe('recipeWarnings bad input', () => {
  it('rejects broken recipes and a NaN temperature', () => {
    expect(() => recipeWarnings({ ...base, weightOfGoodsG: -1 })).toThrow(DyeKitError);
    expect(() => recipeWarnings(base, { maxTempC: NaN })).toThrow(DyeKitError);
    expect(() =>
      recipeWarnings({ ...base, acid: { acid: 'vinegar', acidStrengthPct: 0 } }),
    ).toThrow(DyeKitError);
  });
});
