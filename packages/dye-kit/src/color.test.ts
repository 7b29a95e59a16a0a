import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import Color from 'colorjs.io';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  deltaE2000,
  hexToLab,
  hexToRgb,
  ksFromReflectance,
  labToHex,
  labToLch,
  reflectanceFromKs,
  srgbBytesToLab,
  type Lab,
} from './color.ts';
import { DyeKitError } from './errors.ts';
import { mulberry32 } from './random.ts';

// Copied into the package (source in the file's header) so a clean clone tests on its own.
const tsvPath = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../test-data/ciede2000-sharma-2005.tsv',
);

function sharmaPairs(): Array<{ lab1: Lab; lab2: Lab; expected: number }> {
  const rows = readFileSync(tsvPath, 'utf8')
    .split('\n')
    .filter((line) => line.trim() !== '' && !line.startsWith('#') && !line.startsWith('L1'));
  return rows.map((row) => {
    const [l1, a1, b1, l2, a2, b2, de] = row.split('\t').map(Number) as number[];
    return {
      lab1: { l: l1!, a: a1!, b: b1! },
      lab2: { l: l2!, a: a2!, b: b2! },
      expected: de!,
    };
  });
}

function randomHexes(count: number, seed: number): string[] {
  const random = mulberry32(seed);
  const byte = () => Math.floor(random() * 256);
  const hex = (n: number) => n.toString(16).padStart(2, '0');
  return Array.from({ length: count }, () => `#${hex(byte())}${hex(byte())}${hex(byte())}`);
}

describe('CIEDE2000 (Sharma, Wu & Dalal 2005, Table 1)', () => {
  const pairs = sharmaPairs();

  it('reads all 34 pairs from the reference file', () => {
    expect(pairs).toHaveLength(34);
  });

  it.each(pairs.map((p, i) => [i + 1, p] as const))('pair %i matches to 4 decimals', (_, pair) => {
    expect(deltaE2000(pair.lab1, pair.lab2)).toBeCloseTo(pair.expected, 4);
  });

  it.each(pairs.map((p, i) => [i + 1, p] as const))('pair %i is symmetric', (_, pair) => {
    expect(deltaE2000(pair.lab2, pair.lab1)).toBeCloseTo(deltaE2000(pair.lab1, pair.lab2), 10);
  });
});

describe('sRGB ↔ CIELAB D65 (IEC 61966-2-1; CSS Color 4; CIE 15:2004)', () => {
  it('#FFFFFF is L* 100, a* 0, b* 0 and #000000 is L* 0', () => {
    const white = hexToLab('#FFFFFF');
    expect(white.l).toBeCloseTo(100, 6);
    expect(white.a).toBeCloseTo(0, 6);
    expect(white.b).toBeCloseTo(0, 6);
    expect(hexToLab('#000000')).toEqual({ l: 0, a: 0, b: 0 });
  });

  it('accepts short hex and round-trips every channel value exactly', () => {
    expect(hexToRgb('#fa0')).toEqual(hexToRgb('#ffaa00'));
    for (let v = 0; v < 256; v += 5) {
      const hex = `#${v.toString(16).padStart(2, '0')}80${(255 - v).toString(16).padStart(2, '0')}`;
      expect(labToHex(hexToLab(hex))).toBe(hex);
    }
  });

  it("matches colorjs.io's lab-d65 space on 300 generated colors", () => {
    for (const hex of randomHexes(300, 7)) {
      const expected = new Color(hex).to('lab-d65').coords;
      const lab = hexToLab(hex);
      expect(lab.l).toBeCloseTo(expected[0] ?? NaN, 4);
      expect(lab.a).toBeCloseTo(expected[1] ?? NaN, 4);
      expect(lab.b).toBeCloseTo(expected[2] ?? NaN, 4);
    }
  });

  it('the fast byte path equals the culori conversion (used by palette extraction)', () => {
    const out = new Float64Array(3);
    for (const hex of randomHexes(300, 11)) {
      const { r, g, b } = hexToRgb(hex);
      srgbBytesToLab(Math.round(r * 255), Math.round(g * 255), Math.round(b * 255), out, 0);
      const lab = hexToLab(hex);
      expect(out[0]).toBeCloseTo(lab.l, 9);
      expect(out[1]).toBeCloseTo(lab.a, 9);
      expect(out[2]).toBeCloseTo(lab.b, 9);
    }
  });

  // colorjs.io's deltaE2000 converts to its D50 `lab` first, so hand it our D65 numbers as
  // `lab` coordinates: that compares the two formulas on the very same L*a*b* values.
  it("ΔE2000 matches colorjs.io's deltaE2000 on 300 generated pairs", () => {
    const hexes = randomHexes(600, 13);
    for (let i = 0; i < 600; i += 2) {
      const x = hexToLab(hexes[i]!);
      const y = hexToLab(hexes[i + 1]!);
      const reference = new Color('lab', [x.l, x.a, x.b]).deltaE2000(
        new Color('lab', [y.l, y.a, y.b]),
      );
      expect(deltaE2000(x, y)).toBeCloseTo(reference, 4);
    }
  });

  it('hue angle and chroma follow CIE 15:2004 (pure sRGB blue sits near 306°)', () => {
    const blue = labToLch(hexToLab('#0000ff'));
    expect(blue.h).toBeGreaterThan(300);
    expect(blue.h).toBeLessThan(310);
    expect(labToLch({ l: 50, a: 0, b: -10 })).toEqual({ l: 50, c: 10, h: 270 });
  });
});

describe('ΔE2000 properties (fast-check)', () => {
  // Coordinates on a 0.001 grid: differences below double precision's reach are not colors.
  const coordinate = (min: number, max: number) =>
    fc.integer({ min: min * 1000, max: max * 1000 }).map((n) => n / 1000);
  const lab = fc.record({
    l: coordinate(0, 100),
    a: coordinate(-128, 127),
    b: coordinate(-128, 127),
  });

  it('is ≥ 0, and 0 for identical colors', () => {
    fc.assert(
      fc.property(lab, lab, (x, y) => {
        expect(deltaE2000(x, y)).toBeGreaterThanOrEqual(0);
        expect(deltaE2000(x, x)).toBe(0);
      }),
    );
  });

  it('is 0 only for identical colors', () => {
    fc.assert(
      fc.property(lab, lab, (x, y) => {
        fc.pre(x.l !== y.l || x.a !== y.a || x.b !== y.b);
        expect(deltaE2000(x, y)).toBeGreaterThan(0);
      }),
    );
  });
});

describe('Kubelka–Munk single-constant (Kubelka & Munk 1931)', () => {
  it.each([
    [0.5, 0.25],
    [0.2, 1.6],
    [0.1, 4.05],
  ])('R %f → K/S %f and back', (r, ks) => {
    expect(ksFromReflectance(r)).toBeCloseTo(ks, 10);
    expect(reflectanceFromKs(ks)).toBeCloseTo(r, 10);
  });

  it('white reflects everything: R 1 ↔ K/S 0', () => {
    expect(ksFromReflectance(1)).toBe(0);
    expect(reflectanceFromKs(0)).toBe(1);
  });
});

describe('color bad input', () => {
  it.each(['', 'red', '#12345', '#ggg000', '123456789'])('rejects hex %j', (hex) => {
    expect(() => hexToLab(hex)).toThrow(DyeKitError);
  });

  it('rejects NaN and Infinity in CIELAB and out-of-range reflectance', () => {
    expect(() => deltaE2000({ l: NaN, a: 0, b: 0 }, { l: 0, a: 0, b: 0 })).toThrow(DyeKitError);
    expect(() => labToHex({ l: 50, a: Infinity, b: 0 })).toThrow(DyeKitError);
    expect(() => ksFromReflectance(0)).toThrow(DyeKitError);
    expect(() => ksFromReflectance(1.2)).toThrow(DyeKitError);
    expect(() => reflectanceFromKs(-1)).toThrow(DyeKitError);
    expect(() => reflectanceFromKs(NaN)).toThrow(DyeKitError);
  });
});
