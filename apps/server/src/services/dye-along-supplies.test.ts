import { describe, expect, it } from 'vitest';
import { prepChecklist } from './dye-along-prep.ts';
import { stockJarMl, supplyList, type SupplyColorway } from './dye-along-supplies.ts';

// A small case worked by hand. Formulas (common practice, as in dye-kit):
//   dye mass g = weight of goods g × depth of shade % ÷ 100
//   stock mL   = dye mass g × 100 ÷ stock strength % (w/v: grams per 100 mL)
//   bath mL    = weight of goods g × liquor ratio
//   vinegar (5 %) by rule = 37.5 mL per L of bath, kept between max(60 mL/450 g fiber, 15 mL/L)
//   and 60 mL/L (the middle of the 15–60 mL/L range).

const sockBase = {
  id: '00000000-0000-4000-8000-0000000000b1',
  name: 'Test sock base',
  fiberContent: [
    { fiber: 'wool', pct: 75 },
    { fiber: 'nylon', pct: 25 },
  ],
  superwash: true,
};
const tealJar = '00000000-0000-4000-8000-0000000000a1';
const presoak = {
  instruction: 'Presoak the yarn in lukewarm water.',
  timerSeconds: 1800,
  temperatureC: null,
  caution: 'none' as const,
};
const simmer = {
  instruction: 'Heat to a simmer.',
  timerSeconds: null,
  temperatureC: 85,
  caution: 'hotBath' as const,
};

const pool: SupplyColorway = {
  id: 'c1',
  name: 'Pool',
  technique: 'immersion',
  skeinCount: 2,
  weightOfGoodsG: 100,
  liquorRatio: 30,
  acid: { acid: 'vinegar', acidStrengthPct: 5 },
  recipeLines: [
    {
      id: 'l1',
      kind: 'stock',
      stockSolutionId: tealJar,
      dyeName: 'Teal',
      stockStrengthPct: 1,
      depthOfShadePct: 0.5,
    },
    { id: 'l2', kind: 'foodColor', dyeId: null, colorName: 'Rose', amountPer100g: 2, unit: 'mL' },
  ],
  targetSwatches: [],
  base: sockBase,
  pot: { name: 'Big pot', capacityMl: 8000, material: 'stainlessSteel' },
  steps: [presoak, simmer],
};
const rock: SupplyColorway = {
  ...pool,
  id: 'c2',
  name: 'Rock',
  skeinCount: 1,
  acid: { acid: 'vinegar', acidStrengthPct: 5, amountMl: 20 },
  recipeLines: [
    {
      id: 'l3',
      kind: 'stock',
      stockSolutionId: tealJar,
      dyeName: 'Teal',
      stockStrengthPct: 1,
      depthOfShadePct: 1,
    },
  ],
  steps: [simmer],
};

describe('supply list, summed across colorways (checked by hand)', () => {
  it('one 50 g skein of each colorway, metric', () => {
    const list = supplyList(
      [pool, rock],
      { scope: 'perSkein', weightOfGoodsG: 50 },
      { system: 'metric' },
    );
    const teal = list.dyes.find((d) => d.name === 'Teal')!;
    // Pool: 50 × 0.5 ÷ 100 = 0.25 g → 25 mL of 1 % stock; Rock: 50 × 1 ÷ 100 = 0.5 g → 50 mL.
    expect(teal.volumeMl).toBeCloseTo(75, 9);
    expect(teal.dyeMassG).toBeCloseTo(0.75, 9);
    expect(teal.colorways).toEqual(['Pool', 'Rock']);
    // Jar: 75 mL × 1.25 spare = 93.75 → 100 mL (50 mL steps, at least 100), 1 g of powder.
    expect(teal.mix).toEqual({ volumeMl: 100, powderG: 1 });
    expect(teal.household?.measuredMl).toBeCloseTo(75, 0);
    // Rose: 2 mL per 100 g × 50 g = 1 mL.
    expect(list.dyes.find((d) => d.name === 'Rose')?.amount).toBeCloseTo(1, 9);
    // Pool by rule: bath 50 × 30 = 1500 mL → 1.5 × 37.5 = 56.25 mL (inside 22.5–90);
    // Rock: the host's 20 mL per 100 g → 10 mL. Together 66.25 mL.
    expect(list.acid).toHaveLength(1);
    expect(list.acid[0]!.amountMl).toBeCloseTo(66.25, 9);
    expect(list.yarn).toEqual([
      expect.objectContaining({
        name: 'Test sock base',
        skeins: 2,
        skeinWeightG: 50,
        totalWeightG: 100,
      }),
    ]);
    // Pot for the biggest bath (1500 mL) filled to four-fifths: 1875 mL → 1.9 L.
    expect(list.equipment.find((e) => e.key === 'pot')?.detail).toMatch(/at least 1\.9 L/);
    expect(list.equipment.map((e) => e.key)).toContain('mask');
    expect(list.cautions.join(' ')).toMatch(/dust mask/);
    expect(list.safetyNote).toMatch(/not food/);
  });

  it('in US measures the acid reads as spoons: 66.25 mL ≈ ¼ cup + 1 ½ tsp', () => {
    // ¼ US cup = 59.147 mL; 66.25 − 59.147 = 7.10 mL = 1.44 US tsp (4.929 mL) → 1 ½ tsp.
    const list = supplyList(
      [pool, rock],
      { scope: 'perSkein', weightOfGoodsG: 50 },
      { system: 'us' },
    );
    expect(list.acid[0]!.household.label).toBe('¼ cup + 1 ½ tsp');
    expect(list.equipment.find((e) => e.key === 'pot')?.detail).toMatch(/at least 2 qt \(1\.9 L\)/);
  });

  it("the host's batch: every skein of every colorway", () => {
    const list = supplyList([pool, rock], { scope: 'hostBatch' }, { system: 'metric' });
    const teal = list.dyes.find((d) => d.name === 'Teal')!;
    // Pool: 2 × 100 g × 0.5 % = 1 g → 100 mL; Rock: 100 g × 1 % = 1 g → 100 mL.
    expect(teal.volumeMl).toBeCloseTo(200, 9);
    // 200 × 1.25 = 250 mL jar, 2.5 g of powder.
    expect(teal.mix).toEqual({ volumeMl: 250, powderG: 2.5 });
    // Pool: bath 6000 mL → 6 × 37.5 = 225 mL; Rock: 20 mL. Together 245 mL.
    expect(list.acid[0]!.amountMl).toBeCloseTo(245, 9);
    expect(list.yarn[0]).toMatchObject({ skeins: 3, totalWeightG: 300 });
    // Both colorways use the same pot: listed once.
    expect(list.equipment.filter((e) => e.key.startsWith('pot:')).map((e) => e.item)).toEqual([
      'Pot: Big pot',
    ]);
  });

  it('keeps two strengths of one dye apart, and a liquid stock needs no dust mask', () => {
    const weaker: SupplyColorway = {
      ...rock,
      recipeLines: [
        { ...rock.recipeLines[0]!, stockStrengthPct: 0.1 } as SupplyColorway['recipeLines'][number],
      ],
    };
    const list = supplyList(
      [pool, weaker],
      { scope: 'perSkein', weightOfGoodsG: 100 },
      {
        system: 'metric',
        liquidStockIds: new Set([tealJar]),
      },
    );
    expect(list.dyes.filter((d) => d.name === 'Teal').map((d) => d.stockStrengthPct)).toEqual([
      1, 0.1,
    ]);
    expect(list.equipment.map((e) => e.key)).not.toContain('mask');
  });

  it('rounds stock jars up in 50 mL steps with a spare', () => {
    expect(stockJarMl(10)).toBe(100);
    expect(stockJarMl(81)).toBe(150); // 101.25 → 150
    expect(stockJarMl(200)).toBe(250);
  });
});

describe('prep checklist from the run sheets', () => {
  const list = supplyList(
    [pool, rock],
    { scope: 'perSkein', weightOfGoodsG: 50 },
    { system: 'metric' },
  );
  const checklist = prepChecklist([pool, rock], list, [
    { id: 'h1', text: 'Charge the phone for the stream.', when: 'hourBefore' },
  ]);
  const ids = (items: { id: string }[]) => items.map((i) => i.id);

  it('mixes stocks and sets out a dust mask the day before', () => {
    const mix = checklist.dayBefore.find((i) => i.id.startsWith('mix:'));
    expect(mix?.text).toMatch(/^Mix Teal stock at 1 %: dissolve 1 g of powder .* 100 mL/);
    expect(mix?.caution).toBe('powder');
    expect(ids(checklist.dayBefore)).toEqual(
      expect.arrayContaining(['tie-skeins', 'dust-mask', 'check-supplies']),
    );
  });

  it('soaks, clears the stove and measures the acid an hour before; the host item is kept', () => {
    const soak = checklist.hourBefore.find((i) => i.id === 'soak-yarn');
    expect(soak?.text).toMatch(/at least 30 minutes \(Pool\)/);
    expect(checklist.hourBefore.find((i) => i.id === 'clear-stove')?.caution).toBe('hotBath');
    expect(checklist.hourBefore.find((i) => i.id.startsWith('acid:'))?.text).toMatch(/66\.3 mL/);
    expect(checklist.hourBefore.at(-1)).toMatchObject({
      source: 'host',
      text: 'Charge the phone for the stream.',
    });
  });

  it('an overnight soak moves to the day before', () => {
    const overnight = { ...pool, steps: [{ ...presoak, timerSeconds: 8 * 3600 }] };
    const result = prepChecklist([overnight], list, []);
    expect(ids(result.dayBefore)).toContain('soak-yarn');
    expect(ids(result.hourBefore)).not.toContain('soak-yarn');
  });
});
