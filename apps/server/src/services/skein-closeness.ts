import { randomUUID } from 'node:crypto';
import { extractPalette, hexToLab, paletteCloseness, type Lab } from '@vatside/dye-kit';
import type { YarnCrop } from '@vatside/contracts/submissions';
import type { StoredSwatch } from '@vatside/db/schema';
import { sampleAreaOf, smallCopyOf } from '../uploads/process-image.ts';

// "Close to the inspiration": the main colors of the yarn areas the sharer marked, compared with
// the month's inspiration palette by dye-kit (share-weighted ΔE2000, CIEDE2000 per Sharma, Wu &
// Dalal 2005), told in the kind bands of the references. The number itself is never shown.

const YARN_SWATCHES = 4;
/** Pixels clustered: plenty for four swatches of a yarn area, quick on a busy server. */
const YARN_SAMPLE = 8_000;

/** The palette of all marked yarn areas together, from their RGBA samples. */
export function yarnSamplesPalette(samples: Uint8Array[]): StoredSwatch[] {
  const swatches = extractPalette(new Uint8Array(Buffer.concat(samples)), {
    count: YARN_SWATCHES,
    sampleSize: YARN_SAMPLE,
  });
  return swatches.map((s) => ({ id: randomUUID(), ...s, label: '' }));
}

export interface MarkedPhoto {
  /** The pipeline's upright web rendition. */
  web: Uint8Array;
  crop: YarnCrop;
}

/** The palette of the marked yarn areas of stored web renditions (a skein's areas re-marked). */
export async function yarnAreaPalette(photos: MarkedPhoto[]): Promise<StoredSwatch[]> {
  const samples = await Promise.all(
    photos.map(async (p) => sampleAreaOf(await smallCopyOf(p.web), p.crop)),
  );
  return yarnSamplesPalette(samples);
}

export interface InspirationSwatch {
  lab: Lab;
}

/** The inspiration image's palette, else the month's colorways' target colors (equal shares). */
export function inspirationPalette(
  imagePalette: StoredSwatch[] | null,
  targetHexes: string[],
): InspirationSwatch[] {
  if (imagePalette && imagePalette.length > 0) return imagePalette;
  return targetHexes.map((hex) => ({ lab: hexToLab(hex) }));
}

/** Band and kind words, or null when the month has nothing to compare with. */
export function skeinCloseness(yarn: StoredSwatch[], inspiration: InspirationSwatch[]) {
  if (yarn.length === 0 || inspiration.length === 0) return null;
  // Only the yarn's shares weigh in: each yarn color is matched to its nearest inspiration swatch.
  const { band, message } = paletteCloseness(
    yarn.map((s) => ({ lab: s.lab, share: s.share ?? undefined })),
    inspiration.map((s) => ({ lab: s.lab })),
  );
  return { band, message };
}
