import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deltaE2000, hexToLab, hexToRgb } from './color.ts';
import { DyeKitError } from './errors.ts';
import { closenessBand, extractPalette, paletteCloseness } from './palette.ts';

/** An image of horizontal stripes: each [hex, rows] in order, `width` pixels wide. */
function stripes(bands: Array<[string, number]>, width = 40, alpha = 255): Uint8ClampedArray {
  const rows = bands.reduce((sum, [, n]) => sum + n, 0);
  const data = new Uint8ClampedArray(width * rows * 4);
  let offset = 0;
  for (const [hex, n] of bands) {
    const { r, g, b } = hexToRgb(hex);
    for (let p = 0; p < width * n; p++, offset += 4) {
      data.set([Math.round(r * 255), Math.round(g * 255), Math.round(b * 255), alpha], offset);
    }
  }
  return data;
}

describe('extractPalette (k-means in CIELAB, seeded)', () => {
  const image = stripes([
    ['#1f5f8b', 50],
    ['#e8d5b0', 30],
    ['#3c7a3a', 20],
  ]);

  it('finds the colors of the image and their shares', () => {
    const palette = extractPalette(image, { count: 3 });
    expect(palette.map((s) => s.hex)).toEqual(['#1f5f8b', '#e8d5b0', '#3c7a3a']);
    expect(palette.map((s) => s.share)).toEqual([0.5, 0.3, 0.2]);
    expect(palette[0]!.name).toMatch(/blue/);
    expect(deltaE2000(palette[0]!.lab, hexToLab('#1f5f8b'))).toBeLessThan(1e-6);
  });

  it('is deterministic, on a sample too', () => {
    const noisy = new Uint8ClampedArray(200 * 200 * 4).map((_, i) =>
      i % 4 === 3 ? 255 : (i * 2654435761) % 251,
    );
    const first = extractPalette(noisy, { count: 6, sampleSize: 5000 });
    expect(extractPalette(noisy, { count: 6, sampleSize: 5000 })).toEqual(first);
    expect(first).toHaveLength(6);
  });

  it('accepts ImageData-like input and skips fully transparent pixels', () => {
    const opaque = stripes([['#c03030', 10]]);
    const clear = stripes([['#30c030', 30]], 40, 0);
    const data = new Uint8ClampedArray([...opaque, ...clear]);
    const palette = extractPalette({ data, width: 40, height: 40 }, { count: 2 });
    expect(palette).toEqual([expect.objectContaining({ hex: '#c03030', share: 1 })]);
  });

  it('returns fewer swatches when the image has fewer colors', () => {
    expect(extractPalette(stripes([['#777777', 4]]), { count: 5 })).toHaveLength(1);
  });

  it('shares sum to 1 on any image (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.uint8Array({ minLength: 4, maxLength: 4 * 300 }).filter((a) => a.length % 4 === 0),
        fc.integer({ min: 1, max: 8 }),
        (bytes, count) => {
          const data = new Uint8ClampedArray(bytes);
          for (let i = 3; i < data.length; i += 4) data[i] = 255;
          const palette = extractPalette(data, { count, seed: count });
          expect(palette.reduce((sum, s) => sum + s.share, 0)).toBeCloseTo(1, 12);
          for (const swatch of palette) {
            expect(Number.isNaN(swatch.lab.l + swatch.lab.a + swatch.lab.b)).toBe(false);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('extractPalette bad input', () => {
  it('rejects empty images, images with no visible pixels and bad options', () => {
    expect(() => extractPalette(new Uint8ClampedArray(0), { count: 3 })).toThrow(
      expect.objectContaining({ code: 'EMPTY_IMAGE' }),
    );
    expect(() => extractPalette(stripes([['#ff0000', 2]], 4, 0), { count: 3 })).toThrow(
      expect.objectContaining({ code: 'EMPTY_IMAGE' }),
    );
    expect(() => extractPalette(new Uint8ClampedArray(6), { count: 3 })).toThrow(DyeKitError);
    expect(() =>
      extractPalette({ data: new Uint8ClampedArray(16), width: 3, height: 1 }, { count: 3 }),
    ).toThrow(DyeKitError);
    expect(() => extractPalette(stripes([['#ff0000', 2]]), { count: 0 })).toThrow(DyeKitError);
    expect(() => extractPalette(stripes([['#ff0000', 2]]), { count: NaN })).toThrow(DyeKitError);
    expect(() =>
      extractPalette([1, 2, 3, 4] as unknown as Uint8ClampedArray, { count: 1 }),
    ).toThrow(DyeKitError);
  });
});

describe('paletteCloseness (bands: under 5, 5–10, 10–20, over 20; a product choice)', () => {
  const inspiration = [
    { lab: hexToLab('#1f5f8b'), share: 0.6 },
    { lab: hexToLab('#e8d5b0'), share: 0.4 },
  ];

  it('bands at their edges', () => {
    expect(closenessBand(0)).toBe('veryClose');
    expect(closenessBand(4.99)).toBe('veryClose');
    expect(closenessBand(5)).toBe('close');
    expect(closenessBand(10)).toBe('sameFamily');
    expect(closenessBand(20)).toBe('sameFamily');
    expect(closenessBand(20.01)).toBe('ownStory');
  });

  it('a palette is very close to itself, and an unrelated one tells a story of its own', () => {
    const same = paletteCloseness(inspiration, inspiration);
    expect(same).toMatchObject({ deltaE2000: 0, band: 'veryClose' });
    const hotPink = paletteCloseness([{ lab: hexToLab('#ff1493') }], inspiration);
    expect(hotPink.band).toBe('ownStory');
    expect(hotPink.message).toMatch(/own/);
    expect(hotPink.message).not.toMatch(/fail|poor|bad|wrong|score/i);
  });

  it('weights by the skein palette shares and matches to the nearest swatch', () => {
    const skein = [
      { lab: { ...inspiration[0]!.lab, l: inspiration[0]!.lab.l + 3 }, share: 0.75 },
      { lab: inspiration[1]!.lab, share: 0.25 },
    ];
    const result = paletteCloseness(skein, inspiration);
    expect(result.matches.map((m) => m.nearestIndex)).toEqual([0, 1]);
    expect(result.deltaE2000).toBeCloseTo(0.75 * result.matches[0]!.deltaE2000, 12);
    expect(result.band).toBe('veryClose');
  });

  it('rejects empty palettes and negative shares', () => {
    expect(() => paletteCloseness([], inspiration)).toThrow(DyeKitError);
    expect(() => paletteCloseness(inspiration, [])).toThrow(DyeKitError);
    expect(() => paletteCloseness([{ lab: hexToLab('#ffffff'), share: -1 }], inspiration)).toThrow(
      DyeKitError,
    );
  });
});
