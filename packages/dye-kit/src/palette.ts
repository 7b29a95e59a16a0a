import { deltaE2000, labToHex, srgbBytesToLab, type Lab } from './color.ts';
import { DyeKitError, requireNonNegative } from './errors.ts';
import { describeColor } from './names.ts';
import { mulberry32 } from './random.ts';

export interface Swatch {
  hex: string;
  lab: Lab;
  /** Fraction of the image's opaque pixels closest to this swatch; shares sum to 1. */
  share: number;
  /** Readable name (ISCC–NBS approximation). */
  name: string;
}

/** RGBA bytes, alone or with their dimensions (an ImageData-like object). */
export type PixelInput =
  | Uint8ClampedArray
  | Uint8Array
  | { data: Uint8ClampedArray | Uint8Array; width: number; height: number };

export interface PaletteOptions {
  /** How many swatches to find (1–16); fewer come back when the image has fewer colors. */
  count: number;
  /** Seed of the pseudo-random sampling and k-means++ start: same seed, same palette. */
  seed?: number;
  /** Pixels to cluster; the rest are represented by this sample. */
  sampleSize?: number;
}

const DEFAULT_SEED = 0x5eed;
const DEFAULT_SAMPLE_SIZE = 30_000;
const MAX_COUNT = 16;
const MAX_ITERATIONS = 40;
/** Stop when no center moves more than this in CIELAB units (squared: 0.01²). */
const CONVERGED_SHIFT_SQ = 1e-4;

function pixelBytes(pixels: PixelInput): Uint8ClampedArray | Uint8Array {
  if (pixels instanceof Uint8ClampedArray || pixels instanceof Uint8Array) return pixels;
  if (pixels && typeof pixels === 'object' && 'data' in pixels) {
    const { data, width, height } = pixels;
    if (
      !Number.isInteger(width) ||
      !Number.isInteger(height) ||
      width * height * 4 !== data.length
    ) {
      throw new DyeKitError(
        'INVALID_IMAGE',
        'width × height × 4 must equal the number of bytes.',
        'pixels',
      );
    }
    return pixelBytes(data);
  }
  throw new DyeKitError(
    'INVALID_IMAGE',
    'Pixels must be RGBA bytes (Uint8ClampedArray).',
    'pixels',
  );
}

/** Picks the sample: every opaque pixel if few, else a seeded random draw among them. */
function sampleLab(
  bytes: Uint8ClampedArray | Uint8Array,
  sampleSize: number,
  random: () => number,
) {
  const pixelCount = bytes.length / 4;
  const opaque = new Uint32Array(pixelCount);
  let opaqueCount = 0;
  // Fully transparent pixels are not part of the picture.
  for (let p = 0; p < pixelCount; p++) if (bytes[p * 4 + 3] !== 0) opaque[opaqueCount++] = p;
  if (opaqueCount === 0) {
    throw new DyeKitError('EMPTY_IMAGE', 'The image has no visible pixels.', 'pixels');
  }
  const n = Math.min(sampleSize, opaqueCount);
  const lab = new Float64Array(n * 3);
  for (let i = 0; i < n; i++) {
    const p = n === opaqueCount ? opaque[i]! : opaque[Math.floor(random() * opaqueCount)]!;
    srgbBytesToLab(bytes[p * 4]!, bytes[p * 4 + 1]!, bytes[p * 4 + 2]!, lab, i * 3);
  }
  return { lab, n };
}

function distanceSq(points: Float64Array, i: number, centers: Float64Array, k: number): number {
  const dl = points[i * 3]! - centers[k * 3]!;
  const da = points[i * 3 + 1]! - centers[k * 3 + 1]!;
  const db = points[i * 3 + 2]! - centers[k * 3 + 2]!;
  return dl * dl + da * da + db * db;
}

/** k-means++ seeding (Arthur & Vassilvitskii 2007); stops early when every point is a center. */
function seedCenters(points: Float64Array, n: number, count: number, random: () => number) {
  const centers = new Float64Array(count * 3);
  const nearestSq = new Float64Array(n).fill(Infinity);
  let chosen = 0;
  let next = Math.floor(random() * n);
  while (chosen < count) {
    centers.set(points.subarray(next * 3, next * 3 + 3), chosen * 3);
    chosen++;
    let total = 0;
    for (let i = 0; i < n; i++) {
      const d = distanceSq(points, i, centers, chosen - 1);
      if (d < nearestSq[i]!) nearestSq[i] = d;
      total += nearestSq[i]!;
    }
    if (total === 0) break;
    let target = random() * total;
    next = n - 1;
    for (let i = 0; i < n; i++) {
      target -= nearestSq[i]!;
      if (target < 0) {
        next = i;
        break;
      }
    }
  }
  return { centers, k: chosen };
}

/** Lloyd's k-means in CIELAB (Euclidean, i.e. ΔE*ab); returns centers and cluster sizes. */
function kMeans(points: Float64Array, n: number, count: number, random: () => number) {
  const { centers, k } = seedCenters(points, n, count, random);
  const assignment = new Uint8Array(n);
  const sums = new Float64Array(k * 3);
  const sizes = new Uint32Array(k);
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    sums.fill(0);
    sizes.fill(0);
    for (let i = 0; i < n; i++) {
      let best = 0;
      let bestSq = Infinity;
      for (let c = 0; c < k; c++) {
        const d = distanceSq(points, i, centers, c);
        if (d < bestSq) {
          bestSq = d;
          best = c;
        }
      }
      assignment[i] = best;
      sizes[best]!++;
      sums[best * 3]! += points[i * 3]!;
      sums[best * 3 + 1]! += points[i * 3 + 1]!;
      sums[best * 3 + 2]! += points[i * 3 + 2]!;
    }
    let maxShiftSq = 0;
    for (let c = 0; c < k; c++) {
      const size = sizes[c]!;
      if (size === 0) continue; // An empty cluster keeps its center and is dropped at the end.
      let shiftSq = 0;
      for (let j = 0; j < 3; j++) {
        const mean = sums[c * 3 + j]! / size;
        shiftSq += (mean - centers[c * 3 + j]!) ** 2;
        centers[c * 3 + j] = mean;
      }
      maxShiftSq = Math.max(maxShiftSq, shiftSq);
    }
    if (maxShiftSq < CONVERGED_SHIFT_SQ) break;
  }
  return { centers, sizes, k };
}

/**
 * The main colors of an image with their shares: k-means (k-means++ start, seeded) in CIELAB
 * on a sample of the opaque pixels. Deterministic for a given image, count and seed.
 */
export function extractPalette(pixels: PixelInput, options: PaletteOptions): Swatch[] {
  const bytes = pixelBytes(pixels);
  if (bytes.length === 0)
    throw new DyeKitError('EMPTY_IMAGE', 'The image has no pixels.', 'pixels');
  if (bytes.length % 4 !== 0) {
    throw new DyeKitError('INVALID_IMAGE', 'RGBA pixels take 4 bytes each.', 'pixels');
  }
  const { count } = options;
  if (!Number.isInteger(count) || count < 1 || count > MAX_COUNT) {
    throw new DyeKitError(
      'INVALID_OPTION',
      `count must be a whole number from 1 to ${MAX_COUNT}.`,
      'count',
    );
  }
  const sampleSize = options.sampleSize ?? DEFAULT_SAMPLE_SIZE;
  if (!Number.isInteger(sampleSize) || sampleSize < 1) {
    throw new DyeKitError(
      'INVALID_OPTION',
      'sampleSize must be a positive whole number.',
      'sampleSize',
    );
  }
  const random = mulberry32(options.seed ?? DEFAULT_SEED);
  const { lab: points, n } = sampleLab(bytes, sampleSize, random);
  const { centers, sizes, k } = kMeans(points, n, count, random);

  const swatches: Swatch[] = [];
  for (let c = 0; c < k; c++) {
    const size = sizes[c]!;
    if (size === 0) continue;
    const lab = { l: centers[c * 3]!, a: centers[c * 3 + 1]!, b: centers[c * 3 + 2]! };
    swatches.push({ hex: labToHex(lab), lab, share: size / n, name: describeColor(lab).name });
  }
  return swatches.sort((x, y) => y.share - x.share || y.lab.l - x.lab.l);
}

/** Kind wording for how near a skein came to its inspiration (a product choice, not a grade). */
export type ClosenessBand = 'veryClose' | 'close' | 'sameFamily' | 'ownStory';

export interface PaletteCloseness {
  /** Share-weighted mean ΔE2000 from each swatch of A to its nearest swatch in B. */
  deltaE2000: number;
  band: ClosenessBand;
  message: string;
  /** For each swatch of A, the index of its nearest swatch in B and their ΔE2000. */
  matches: Array<{ index: number; nearestIndex: number; deltaE2000: number }>;
}

const BAND_MESSAGES: Record<ClosenessBand, string> = {
  veryClose: 'Very close to the inspiration: these colors sit right beside it.',
  close: 'Close to the inspiration, with a touch of its own.',
  sameFamily: 'In the same color family as the inspiration.',
  ownStory: 'A color story of its own, sparked by the inspiration.',
};

/** Bands of ΔE2000: under 5, 5–10, 10–20, over 20 (packages/dye-kit/test-data/README.md). */
export function closenessBand(deltaE: number): ClosenessBand {
  requireNonNegative('deltaE2000', deltaE);
  if (deltaE < 5) return 'veryClose';
  if (deltaE < 10) return 'close';
  if (deltaE <= 20) return 'sameFamily';
  return 'ownStory';
}

type PaletteLike = ReadonlyArray<{ lab: Lab; share?: number }>;

function weights(palette: PaletteLike, field: string): number[] {
  if (!Array.isArray(palette as unknown) || palette.length === 0) {
    throw new DyeKitError('INVALID_OPTION', `${field} needs at least one swatch.`, field);
  }
  const raw = palette.map((s, i) => requireNonNegative(`${field}[${i}].share`, s.share ?? 1));
  const total = raw.reduce((sum, w) => sum + w, 0);
  if (total === 0) throw new DyeKitError('INVALID_OPTION', `${field} shares are all zero.`, field);
  return raw.map((w) => w / total);
}

/**
 * How close palette A (e.g. the yarn in a submitted photo) comes to palette B (the
 * inspiration): each swatch of A is matched to its nearest swatch of B by ΔE2000, weighted by
 * A's shares (equal when absent).
 */
export function paletteCloseness(paletteA: PaletteLike, paletteB: PaletteLike): PaletteCloseness {
  const weightsA = weights(paletteA, 'paletteA');
  weights(paletteB, 'paletteB');
  const matches = paletteA.map((swatch, index) => {
    let nearestIndex = 0;
    let best = Infinity;
    paletteB.forEach((other, j) => {
      const d = deltaE2000(swatch.lab, other.lab);
      if (d < best) {
        best = d;
        nearestIndex = j;
      }
    });
    return { index, nearestIndex, deltaE2000: best };
  });
  const mean = matches.reduce((sum, m, i) => sum + m.deltaE2000 * weightsA[i]!, 0);
  const band = closenessBand(mean);
  return { deltaE2000: mean, band, message: BAND_MESSAGES[band], matches };
}
