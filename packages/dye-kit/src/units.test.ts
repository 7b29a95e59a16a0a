import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DyeKitError } from './errors.ts';
import {
  celsiusToFahrenheit,
  convert,
  convertDetailed,
  fahrenheitToCelsius,
  type Unit,
} from './units.ts';

describe('US customary units (NIST Handbook 44 App. C; NIST SP 811): exact factors', () => {
  it.each([
    ['gal', 'L', 3.785411784],
    ['cup', 'mL', 236.5882365],
    ['floz', 'mL', 29.5735295625],
    ['tbsp', 'mL', 14.78676478125],
    ['tsp', 'mL', 4.92892159375],
    ['oz', 'g', 28.349523125],
    ['lb', 'g', 453.59237],
    ['yd', 'm', 0.9144],
  ] as const)('1 %s = %f %s', (from, to, factor) => {
    expect(convert(1, from, to)).toBe(factor);
  });

  it('keeps the customary relations: 16 cups, 128 fl oz, 256 tbsp, 768 tsp to the gallon', () => {
    expect(convert(1, 'gal', 'cup')).toBeCloseTo(16, 12);
    expect(convert(1, 'gal', 'floz')).toBeCloseTo(128, 12);
    expect(convert(1, 'gal', 'tbsp')).toBeCloseTo(256, 12);
    expect(convert(1, 'gal', 'tsp')).toBeCloseTo(768, 12);
    expect(convert(16, 'oz', 'lb')).toBeCloseTo(1, 12);
  });

  it('the customary cup is not the 240 mL nutrition-label cup (21 CFR 101.9, from memory)', () => {
    expect(convert(1, 'cup', 'mL')).not.toBe(240);
  });
});

describe('metric kitchen measures (common metric convention, from memory)', () => {
  it('5 mL teaspoon, 15 mL tablespoon, 250 mL cup', () => {
    expect(convert(1, 'metricTsp', 'mL')).toBe(5);
    expect(convert(1, 'metricTbsp', 'mL')).toBe(15);
    expect(convert(1, 'metricCup', 'mL')).toBe(250);
    expect(convert(1, 'metricTbsp', 'metricTsp')).toBe(3);
  });
});

describe('drops (USP <1101>: about 20 drops per mL, from memory)', () => {
  it('are approximate and follow the bottle calibration', () => {
    expect(convertDetailed(1, 'mL', 'drop')).toEqual({
      value: 20,
      unit: 'drop',
      approximate: true,
    });
    expect(convert(30, 'drop', 'mL', { dropsPerMl: 15 })).toBe(2);
    expect(convertDetailed(1, 'tsp', 'mL').approximate).toBe(false);
  });
});

describe('mass ↔ volume needs a density', () => {
  it('converts with one and refuses without', () => {
    expect(convert(250, 'mL', 'g', { densityGPerMl: 1 })).toBe(250);
    expect(convert(2, 'g', 'mL', { densityGPerMl: 0.8 })).toBeCloseTo(2.5, 12);
    expect(() => convert(1, 'g', 'mL')).toThrow(/without a density/);
  });
});

describe('convert round trips (fast-check)', () => {
  const units: Unit[] = [
    'g',
    'oz',
    'lb',
    'mL',
    'L',
    'tsp',
    'tbsp',
    'cup',
    'floz',
    'gal',
    'metricTsp',
    'metricTbsp',
    'metricCup',
    'drop',
    'm',
    'yd',
  ];
  const dimension = (u: Unit) =>
    ['g', 'oz', 'lb'].includes(u) ? 'mass' : ['m', 'yd'].includes(u) ? 'length' : 'volume';

  it('there and back returns the amount', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.constantFrom(...units),
        fc.constantFrom(...units),
        (value, from, to) => {
          fc.pre(dimension(from) === dimension(to));
          const back = convert(convert(value, from, to), to, from);
          expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, value));
        },
      ),
    );
  });
});

describe('temperature', () => {
  it('water boils at 100 °C = 212 °F and a simmer at 85 °C is 185 °F', () => {
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(85)).toBe(185);
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
  });

  it('round trips', () => {
    fc.assert(
      fc.property(fc.double({ min: -273.15, max: 1000, noNaN: true }), (c) => {
        expect(fahrenheitToCelsius(celsiusToFahrenheit(c))).toBeCloseTo(c, 9);
      }),
    );
  });
});

describe('units bad input', () => {
  it.each([NaN, Infinity, -Infinity, -1])('rejects amount %f with INVALID_AMOUNT', (value) => {
    expect(() => convert(value, 'g', 'oz')).toThrow(
      expect.objectContaining({ code: 'INVALID_AMOUNT' }),
    );
  });

  it('rejects unknown and incompatible units with their codes', () => {
    expect(() => convert(1, 'pinch', 'g')).toThrow(
      expect.objectContaining({ code: 'UNKNOWN_UNIT' }),
    );
    expect(() => convert(1, 'g', 'toString')).toThrow(
      expect.objectContaining({ code: 'UNKNOWN_UNIT' }),
    );
    expect(() => convert(1, 'g', 'm')).toThrow(
      expect.objectContaining({ code: 'INCOMPATIBLE_UNITS' }),
    );
    expect(() => convert(1, 'lb', 'cup')).toThrow(
      expect.objectContaining({ code: 'INCOMPATIBLE_UNITS' }),
    );
    expect(() => convert(1, 'yd', 'mL', { densityGPerMl: 1 })).toThrow(DyeKitError);
    expect(() => convert(1, 'mL', 'drop', { dropsPerMl: 0 })).toThrow(DyeKitError);
  });

  it('rejects temperatures that are not finite or below absolute zero', () => {
    expect(() => celsiusToFahrenheit(NaN)).toThrow(DyeKitError);
    expect(() => celsiusToFahrenheit(-300)).toThrow(DyeKitError);
    expect(() => fahrenheitToCelsius(Infinity)).toThrow(DyeKitError);
    expect(() => fahrenheitToCelsius(-500)).toThrow(DyeKitError);
  });
});
