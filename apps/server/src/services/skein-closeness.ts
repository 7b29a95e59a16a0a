import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { extractPalette, hexToLab, paletteCloseness, type Lab } from '@vatside/dye-kit';
import type { YarnCrop } from '@vatside/contracts/submissions';
import type { StoredSwatch } from '@vatside/db/schema';

// "Close to the inspiration": the main colors of the yarn areas the sharer marked, compared with
// the month's inspiration palette by dye-kit (share-weighted ΔE2000, CIEDE2000 per Sharma, Wu &
// Dalal 2005), told in the kind bands of the references. The number itself is never shown.

/** Each yarn area is sampled from a copy this small: enough pixels for k-means, quick to read. */
const AREA_MAX_PX = 128;
const YARN_SWATCHES = 4;
/** Pixels clustered: plenty for four swatches of a yarn area, quick on a busy server. */
const YARN_SAMPLE = 8_000;

export interface MarkedPhoto {
  /** The pipeline's upright web rendition. */
  web: Uint8Array;
  width: number;
  height: number;
  crop: YarnCrop;
}

/** The crop in whole pixels, at least one pixel, inside the picture. */
function cropPixels({ width, height, crop }: MarkedPhoto) {
  const left = Math.min(width - 1, Math.floor(crop.x * width));
  const top = Math.min(height - 1, Math.floor(crop.y * height));
  return {
    left,
    top,
    width: Math.max(1, Math.min(width - left, Math.round(crop.width * width))),
    height: Math.max(1, Math.min(height - top, Math.round(crop.height * height))),
  };
}

/** The palette of all marked yarn areas together (RGBA bytes of each area, concatenated). */
export async function yarnAreaPalette(photos: MarkedPhoto[]): Promise<StoredSwatch[]> {
  const areas = await Promise.all(
    photos.map((p) =>
      sharp(p.web)
        .extract(cropPixels(p))
        .resize({
          width: AREA_MAX_PX,
          height: AREA_MAX_PX,
          fit: 'inside',
          withoutEnlargement: true,
        })
        .ensureAlpha()
        .raw()
        .toBuffer(),
    ),
  );
  const swatches = extractPalette(new Uint8Array(Buffer.concat(areas)), {
    count: YARN_SWATCHES,
    sampleSize: YARN_SAMPLE,
  });
  return swatches.map((s) => ({ id: randomUUID(), ...s, label: '' }));
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
