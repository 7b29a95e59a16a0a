import { describe, expect, it } from 'vitest';
import { hexToLab } from './color.ts';
import { DyeKitError } from './errors.ts';
import { describeColor } from './names.ts';

// ISCC–NBS-style names (Kelly & Judd, NBS SP 440): an approximation, so the checks are about
// hue family and modifier, not exact ISCC–NBS block names.
describe('describeColor (ISCC–NBS approximation)', () => {
  it.each([
    ['#ffffff', 'white'],
    ['#000000', 'black'],
    ['#808080', 'medium gray'],
    ['#ff0000', 'vivid red'],
    ['#ffff00', 'vivid yellow'],
    ['#0000ff', 'vivid blue'],
    ['#000080', 'deep blue'],
    ['#008000', 'vivid green'],
    ['#ffc0cb', 'pale pink'],
    ['#8b4513', 'deep brown'],
    ['#808000', 'strong olive'],
    ['#008080', 'dark bluish green'],
    ['#800080', 'deep purple'],
    ['#87ceeb', 'light blue'],
  ])('%s reads as "%s"', (hex, name) => {
    expect(describeColor(hexToLab(hex)).name).toBe(name);
  });

  it('near-neutrals get "-ish gray" names', () => {
    expect(describeColor({ l: 60, a: -2, b: -8 })).toEqual({
      name: 'bluish gray',
      hue: 'blue',
      modifier: null,
    });
  });

  it('rejects a color with NaN', () => {
    expect(() => describeColor({ l: NaN, a: 0, b: 0 })).toThrow(DyeKitError);
  });
});
