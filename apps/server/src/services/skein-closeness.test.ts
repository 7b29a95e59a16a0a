import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import { inspirationPalette, skeinCloseness, yarnAreaPalette } from './skein-closeness.ts';

// The inspiration: three known colors (water, sand, rust), equal shares.
const INSPIRATION = ['#1f6f78', '#d9c8a0', '#b5532b'];
const inspiration = inspirationPalette(null, INSPIRATION);

/** A lossless photo: `yarn` fills the left half, `other` the right. */
async function photo(yarn: string, other: string) {
  const half = await sharp({ create: { width: 60, height: 80, channels: 3, background: yarn } })
    .png()
    .toBuffer();
  const web = await sharp({ create: { width: 120, height: 80, channels: 3, background: other } })
    .composite([{ input: half, left: 0, top: 0 }])
    .png()
    .toBuffer();
  return { web };
}
const LEFT = { x: 0, y: 0, width: 0.5, height: 1 };
const RIGHT = { x: 0.5, y: 0, width: 0.5, height: 1 };

/** Nearest inspiration swatch by CIEDE2000 (Sharma, Wu & Dalal 2005, through dye-kit). */
const nearest = (hex: string) =>
  Math.min(...INSPIRATION.map((h) => deltaE2000(hexToLab(hex), hexToLab(h))));

describe('close to the inspiration, from the marked yarn area', () => {
  it('reads only the marked area: a steel teal beside magenta is "close"', async () => {
    const yarn = '#2d6f86';
    // By hand: ΔE2000 to the water swatch is about 7.0, inside the 5–10 band.
    expect(nearest(yarn)).toBeGreaterThan(5.5);
    expect(nearest(yarn)).toBeLessThan(9.5);
    const palette = await yarnAreaPalette([{ ...(await photo(yarn, '#d81b9a')), crop: LEFT }]);
    for (const s of palette) expect(deltaE2000(s.lab, hexToLab(yarn))).toBeLessThan(1);
    expect(skeinCloseness(palette, inspiration)).toEqual({
      band: 'close',
      message: 'Close to the inspiration, with a touch of its own.',
    });
  });

  it('the same photo marked on the magenta half tells its own color story', async () => {
    expect(nearest('#d81b9a')).toBeGreaterThan(20);
    const palette = await yarnAreaPalette([
      { ...(await photo('#2d6f86', '#d81b9a')), crop: RIGHT },
    ]);
    expect(skeinCloseness(palette, inspiration)?.band).toBe('ownStory');
  });

  it('two photos weigh in together: very close teal and sand-family chartreuse', async () => {
    const teal = '#246f7a'; // ≈ 1.2 from the water swatch
    const chartreuse = '#c8d050'; // ≈ 16.1 from the sand swatch
    expect(nearest(teal)).toBeLessThan(2);
    expect(nearest(chartreuse)).toBeGreaterThan(12);
    expect(nearest(chartreuse)).toBeLessThan(18);
    const palette = await yarnAreaPalette([
      { ...(await photo(teal, '#000000')), crop: LEFT },
      { ...(await photo(chartreuse, '#000000')), crop: LEFT },
    ]);
    // Equal areas: the share-weighted mean is the midpoint, ≈ 8.7, so "close".
    const expected = (nearest(teal) + nearest(chartreuse)) / 2;
    expect(expected).toBeGreaterThan(5);
    expect(expected).toBeLessThan(10);
    expect(skeinCloseness(palette, inspiration)?.band).toBe('close');
  });

  it('with nothing to compare with there is no band (never a made-up one)', async () => {
    const palette = await yarnAreaPalette([{ ...(await photo('#2d6f86', '#000000')), crop: LEFT }]);
    expect(skeinCloseness(palette, inspirationPalette([], []))).toBeNull();
  });
});
