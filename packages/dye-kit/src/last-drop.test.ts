import { describe, expect, it } from 'vitest';
import { labToLch } from './color.ts';
import { DyeKitError } from './errors.ts';
import { lastDrop, mixPreview } from './last-drop.ts';

describe('lastDrop (common practice: dye mass sets depth, volume sets spread)', () => {
  const leftovers = [
    { stockStrengthPct: 1, volumeMl: 60 },
    { stockStrengthPct: 0.5, volumeMl: 40 },
  ];

  it('adds up the dye and gives the depth of shade on the skein', () => {
    const result = lastDrop({ leftovers, weightOfGoodsG: 100 });
    expect(result.totalDyeMassG).toBeCloseTo(0.8, 12);
    expect(result.depthOfShadePct).toBeCloseTo(0.8, 12);
    expect(result.totalVolumeMl).toBe(100);
    expect(result.combinedStrengthPct).toBeCloseTo(0.8, 12);
  });

  it('diluting to 700 mL changes the spread but not the depth', () => {
    const concentrated = lastDrop({ leftovers, weightOfGoodsG: 100, targetSpreadVolumeMl: 100 });
    const diluted = lastDrop({ leftovers, weightOfGoodsG: 100, targetSpreadVolumeMl: 700 });
    expect(diluted.depthOfShadePct).toBe(concentrated.depthOfShadePct);
    expect(diluted.spread.waterToAddMl).toBe(600);
    expect(diluted.spread.dilutedStrengthPct).toBeCloseTo(0.8 / 7, 12);
    expect(concentrated.spread.waterToAddMl).toBe(0);
    expect(concentrated.warnings.map((w) => w.code)).toContain('ALREADY_DILUTE');
  });

  it('warns when leftovers exceed about 4 % DOS on the skein', () => {
    const result = lastDrop({
      leftovers: [{ stockStrengthPct: 2, volumeMl: 300 }],
      weightOfGoodsG: 100,
    });
    expect(result.depthOfShadePct).toBe(6);
    expect(result.warnings.map((w) => w.code)).toContain('DEPTH_OF_SHADE_HIGH');
  });

  it('previews the mix only when every leftover has a color', () => {
    expect(lastDrop({ leftovers, weightOfGoodsG: 100 }).mixPreview).toBeNull();
  });

  it('blue and yellow preview as a green (Kubelka–Munk mix, approximate)', () => {
    const result = lastDrop({
      leftovers: [
        { stockStrengthPct: 1, volumeMl: 50, color: '#f2c400' },
        { stockStrengthPct: 1, volumeMl: 50, color: '#1f5fbf' },
      ],
      weightOfGoodsG: 100,
    });
    expect(result.mixPreview?.approximate).toBe(true);
    expect(result.mixPreview?.name).toMatch(/green/);
  });

  it('complements mix muddy and get a warning', () => {
    const result = lastDrop({
      leftovers: [
        { stockStrengthPct: 1, volumeMl: 50, color: '#d0202a' },
        { stockStrengthPct: 1, volumeMl: 50, color: '#1fa050' },
      ],
      weightOfGoodsG: 100,
    });
    expect(result.warnings.map((w) => w.code)).toContain('MIX_MAY_BE_MUDDY');
  });

  it('a color mixed with itself stays itself', () => {
    const preview = mixPreview([
      { color: '#3a7bd5', weight: 1 },
      { color: '#3a7bd5', weight: 3 },
    ]);
    expect(preview.hex).toBe('#3a7bd5');
    expect(labToLch(preview.lab).c).toBeGreaterThan(30);
  });
});

describe('lastDrop bad input', () => {
  it('rejects empty, negative and NaN amounts, zero strength and bad colors', () => {
    expect(() => lastDrop({ leftovers: [], weightOfGoodsG: 100 })).toThrow(DyeKitError);
    expect(() =>
      lastDrop({ leftovers: [{ stockStrengthPct: 1, volumeMl: -5 }], weightOfGoodsG: 100 }),
    ).toThrow(DyeKitError);
    expect(() =>
      lastDrop({ leftovers: [{ stockStrengthPct: 0, volumeMl: 5 }], weightOfGoodsG: 100 }),
    ).toThrow(DyeKitError);
    expect(() =>
      lastDrop({ leftovers: [{ stockStrengthPct: 1, volumeMl: 5 }], weightOfGoodsG: NaN }),
    ).toThrow(DyeKitError);
    expect(() =>
      lastDrop({
        leftovers: [{ stockStrengthPct: 1, volumeMl: 5 }],
        weightOfGoodsG: 100,
        targetSpreadVolumeMl: 0,
      }),
    ).toThrow(DyeKitError);
    expect(() =>
      lastDrop({
        leftovers: [{ stockStrengthPct: 1, volumeMl: 5, color: 'teal' }],
        weightOfGoodsG: 100,
      }),
    ).toThrow(expect.objectContaining({ code: 'INVALID_COLOR' }));
  });
});
