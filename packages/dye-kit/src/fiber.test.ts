import { describe, expect, it } from 'vitest';
import { DyeKitError } from './errors.ts';
import { FIBER_NAMES, fiberCheck, takesAcidDye, type FiberName } from './fiber.ts';

describe('fiber compatibility (common practice)', () => {
  it.each(['wool', 'alpaca', 'mohair', 'silk', 'angora', 'nylon'] as const)(
    '%s takes acid dyes and food color',
    (fiber) => {
      expect(takesAcidDye(fiber)).toBe(true);
    },
  );

  it.each(['cotton', 'linen', 'bambooViscose', 'acrylic', 'polyester'] as const)(
    '%s does not',
    (fiber) => {
      expect(takesAcidDye(fiber)).toBe(false);
    },
  );

  it('a 75/25 wool/nylon sock blend takes color all through', () => {
    const check = fiberCheck([
      { fiber: 'wool', pct: 75 },
      { fiber: 'nylon', pct: 25 },
    ]);
    expect(check.takesDyePct).toBe(100);
    expect(check.doesNotTakePct).toBe(0);
    expect(check.warnings.map((w) => w.code)).toEqual(['WOOL_FELTS']);
  });

  it('a wool/cotton blend only partly takes color', () => {
    const check = fiberCheck(
      [
        { fiber: 'wool', pct: 60 },
        { fiber: 'cotton', pct: 40 },
      ],
      { superwash: true },
    );
    expect(check.takesDyePct).toBe(60);
    expect(check.doesNotTakePct).toBe(40);
    expect(check.warnings.map((w) => w.code)).toEqual(['FIBER_BLEND', 'SUPERWASH_STRIKES_FAST']);
  });

  it('acrylic takes nothing; silk does not felt', () => {
    expect(fiberCheck([{ fiber: 'acrylic', pct: 100 }]).warnings[0]).toMatchObject({
      code: 'FIBER_TAKES_NO_DYE',
      severity: 'critical',
    });
    expect(fiberCheck([{ fiber: 'silk', pct: 100 }]).warnings).toEqual([]);
  });

  it('knows every listed fiber', () => {
    for (const fiber of FIBER_NAMES)
      expect(fiberCheck([{ fiber, pct: 100 }]).fibers[0]?.fiber).toBe(fiber);
  });
});

describe('fiberCheck bad input', () => {
  it('rejects percentages that do not add to 100, unknown fibers, duplicates and empty lists', () => {
    expect(() => fiberCheck([{ fiber: 'wool', pct: 80 }])).toThrow(
      expect.objectContaining({ code: 'INVALID_FIBER_CONTENT' }),
    );
    expect(() => fiberCheck([{ fiber: 'hemp' as FiberName, pct: 100 }])).toThrow(DyeKitError);
    expect(() =>
      fiberCheck([
        { fiber: 'wool', pct: 50 },
        { fiber: 'wool', pct: 50 },
      ]),
    ).toThrow(DyeKitError);
    expect(() => fiberCheck([])).toThrow(DyeKitError);
    expect(() => fiberCheck([{ fiber: 'wool', pct: NaN }])).toThrow(DyeKitError);
    expect(() =>
      fiberCheck([
        { fiber: 'wool', pct: 120 },
        { fiber: 'nylon', pct: -20 },
      ]),
    ).toThrow(DyeKitError);
  });
});
