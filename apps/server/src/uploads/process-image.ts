import { randomUUID } from 'node:crypto';
import { availableParallelism } from 'node:os';
import sharp, { type Metadata, type Sharp } from 'sharp';
import { describeColor, extractPalette, hexToLab } from '@vatside/dye-kit';
import type { StoredSwatch } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';
import { refuseTrailingData, sniffImageType } from './sniff.ts';

// The upload pipeline after the bytes arrive: sniff → pixel limit (before decoding) → refuse
// trailing data → one decode of the upload into the web rendition (oriented, sRGB, web size, no
// metadata) → that rendition read back small → thumbnail, palette and marked area.

export const WEB_MAX_PX = 1600;
export const THUMB_MAX_PX = 400;
/** The palette is found on a small copy: plenty of pixels for k-means, quick to decode. */
const PALETTE_MAX_PX = 256;
const OUTPUT_TYPE = 'image/jpeg';
/**
 * Every resize here is a reduction: a triangle filter (antialiased, its support scaled by the
 * reduction) costs about a quarter less than the default Lanczos-3 on a 12-megapixel photo
 * (measured), and at web and thumbnail size the difference in sharpness does not show.
 */
const REDUCE = 'linear';

/** At most `maxPx` a side, never enlarged. */
const fitInside = (maxPx: number) =>
  ({
    width: maxPx,
    height: maxPx,
    fit: 'inside',
    withoutEnlargement: true,
    kernel: REDUCE,
  }) as const;

export interface Rendition {
  data: Buffer;
  width: number;
  height: number;
  contentType: string;
}

export interface ProcessedImage {
  web: Rendition;
  thumb: Rendition;
  palette: StoredSwatch[];
  /** RGBA pixels of `sampleArea` (from the small copy), at most AREA_SAMPLE_MAX_PX a side; or empty. */
  areaSample: Uint8Array;
}

/** A rectangle in fractions of the upright picture's width and height. */
export interface AreaFractions {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface ProcessOptions {
  maxPixels: number;
  /** Swatches of the whole image's palette; 0 skips it (a shared skein reads its yarn area). */
  swatchCount: number;
  /** An area to hand back as pixels (a skein's marked yarn), read in the same turn. */
  sampleArea?: AreaFractions;
}

/** An area is sampled from a copy this small: enough pixels for k-means, quick to read. */
export const AREA_SAMPLE_MAX_PX = 128;

/** The area in whole pixels, at least one pixel, inside the picture. */
function areaPixels(width: number, height: number, area: AreaFractions) {
  const left = Math.min(width - 1, Math.floor(area.x * width));
  const top = Math.min(height - 1, Math.floor(area.y * height));
  return {
    left,
    top,
    width: Math.max(1, Math.min(width - left, Math.round(area.width * width))),
    height: Math.max(1, Math.min(height - top, Math.round(area.height * height))),
  };
}

/**
 * RGBA pixels of an area of a picture (its small copy, `smallCopyOf`), shrunk to at most
 * AREA_SAMPLE_MAX_PX a side.
 */
export async function sampleAreaOf(small: Decoded, area: AreaFractions): Promise<Uint8Array> {
  return fromDecoded(small)
    .extract(areaPixels(small.raw.width, small.raw.height, area))
    .resize(fitInside(AREA_SAMPLE_MAX_PX))
    .ensureAlpha()
    .raw()
    .toBuffer();
}

// Decoding a phone photo takes a core and tens of megabytes: at most one image per core is in
// the pipeline, each on one libvips thread, and the rest wait their turn (first come, first
// served). Twenty shares at once then finish one after another instead of all at the end, and
// memory stays bounded.
sharp.concurrency(1);
// Every upload is a new buffer, so libvips' operation cache never hits; it would only hold memory.
sharp.cache(false);
const IMAGE_SLOTS = Math.max(1, availableParallelism());
let busy = 0;
const waiting: (() => void)[] = [];

async function inTurn<T>(work: () => Promise<T>): Promise<T> {
  if (busy >= IMAGE_SLOTS) await new Promise<void>((resolve) => waiting.push(resolve));
  else busy++;
  try {
    return await work();
  } finally {
    const next = waiting.shift();
    if (next) next();
    else busy--;
  }
}

const unreadable = () =>
  new HttpError(
    422,
    'UNPROCESSABLE_IMAGE',
    'This image could not be read; it may be damaged. Save it again and upload that copy.',
  );

/** Reads only the header: width × height is checked before a single pixel is decoded. */
async function readHeader(bytes: Uint8Array, maxPixels: number): Promise<Metadata> {
  const header = await sharp(bytes, { limitInputPixels: false })
    .metadata()
    .catch(() => {
      throw unreadable();
    });
  const { width = 0, height = 0 } = header;
  if (width * height > maxPixels) {
    const megapixels = (maxPixels / 1e6).toFixed(0);
    throw new HttpError(
      422,
      'UNPROCESSABLE_IMAGE',
      `This image is ${width} × ${height} pixels, more than the ${megapixels} megapixels we accept. Resize it and try again.`,
    );
  }
  return header;
}

/** Raw pixels with their layout. */
export interface Decoded {
  pixels: Buffer;
  raw: { width: number; height: number; channels: 1 | 2 | 3 | 4 };
}

const fromDecoded = ({ pixels, raw }: Decoded) => sharp(pixels, { raw });

/**
 * A fresh JPEG: plain libjpeg with its standard Huffman tables. The optimized-table pass doubled
 * the encode time of a 1600-px photo (measured) to save 6 % of its bytes, and mozjpeg's trellis
 * search cost more still. Sharp writes no EXIF, XMP, IPTC or ICC data without
 * `keepMetadata`/`withMetadata`.
 */
async function encode(input: Sharp): Promise<Rendition> {
  const { data, info } = await input
    .jpeg({ quality: 82, optimiseCoding: false })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, contentType: OUTPUT_TYPE };
}

/**
 * The one decode of the upload, straight into the web rendition: `failOn: 'error'` refuses
 * damaged and truncated data; `rotate()` applies the EXIF orientation; resizing straight after
 * lets libjpeg decode at a fraction of full size (shrink-on-load); `sequentialRead` reads the
 * input top to bottom once. An embedded profile (e.g. Display P3) is converted to sRGB by sharp
 * itself; other color spaces (grey, CMYK) and transparency are handled only when the header says
 * they are there. Encoding in the same pipeline cost less than handing raw pixels to a second
 * one (about 15 ms per 12-megapixel photo, measured).
 */
async function webRenditionOf(
  bytes: Uint8Array,
  header: Metadata,
  maxPixels: number,
): Promise<Rendition> {
  let picture = sharp(bytes, { limitInputPixels: maxPixels, failOn: 'error', sequentialRead: true })
    .rotate()
    .resize(fitInside(WEB_MAX_PX));
  if (header.hasAlpha) picture = picture.flatten({ background: '#ffffff' });
  if (header.space !== 'srgb' || header.channels !== 3) picture = picture.toColourspace('srgb');
  return encode(picture);
}

/**
 * A web rendition read back at thumbnail size: libjpeg decodes it at a quarter scale for next to
 * nothing. The thumbnail, the palette and the marked yarn area all come from these pixels, when a
 * photo is shared and again whenever its yarn area is marked anew.
 */
export async function smallCopyOf(web: Uint8Array): Promise<Decoded> {
  const { data, info } = await sharp(web)
    .resize(fitInside(THUMB_MAX_PX))
    .raw()
    .toBuffer({ resolveWithObject: true });
  return { pixels: data, raw: { width: info.width, height: info.height, channels: info.channels } };
}

async function paletteOf(small: Decoded, swatchCount: number): Promise<StoredSwatch[]> {
  const { data, info } = await fromDecoded(small)
    .resize(fitInside(PALETTE_MAX_PX))
    .ensureAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  const swatches = extractPalette(
    { data, width: info.width, height: info.height },
    { count: swatchCount },
  );
  return swatches.map((s) => ({ id: randomUUID(), ...s, label: '' }));
}

export async function processImage(
  bytes: Uint8Array,
  options: ProcessOptions,
): Promise<ProcessedImage> {
  const type = await sniffImageType(bytes);
  const header = await readHeader(bytes, options.maxPixels);
  refuseTrailingData(bytes, type);
  return inTurn(async () => {
    try {
      const web = await webRenditionOf(bytes, header, options.maxPixels);
      const small = await smallCopyOf(web.data);
      const thumb = await encode(fromDecoded(small));
      const palette = options.swatchCount > 0 ? await paletteOf(small, options.swatchCount) : [];
      const areaSample = options.sampleArea
        ? await sampleAreaOf(small, options.sampleArea)
        : new Uint8Array(0);
      return { web, thumb, palette, areaSample };
    } catch (error) {
      if (error instanceof HttpError) throw error;
      throw unreadable();
    }
  });
}

const hex2 = (n: number) => Math.round(n).toString(16).padStart(2, '0');

/** Radius of the averaged square around a picked point: evens out JPEG noise. */
const PICK_RADIUS_PX = 2;

/** The color under a point (fractions of width and height) of a rendition, as a swatch. */
export async function swatchAt(
  rendition: Uint8Array,
  x: number,
  y: number,
  label: string,
): Promise<StoredSwatch> {
  const { data, info } = await sharp(rendition)
    .removeAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  const cx = Math.min(info.width - 1, Math.floor(x * info.width));
  const cy = Math.min(info.height - 1, Math.floor(y * info.height));
  const sum = [0, 0, 0];
  let n = 0;
  for (
    let py = Math.max(0, cy - PICK_RADIUS_PX);
    py <= Math.min(info.height - 1, cy + PICK_RADIUS_PX);
    py++
  ) {
    for (
      let px = Math.max(0, cx - PICK_RADIUS_PX);
      px <= Math.min(info.width - 1, cx + PICK_RADIUS_PX);
      px++
    ) {
      const at = (py * info.width + px) * info.channels;
      for (let c = 0; c < 3; c++) sum[c]! += data[at + c]!;
      n++;
    }
  }
  const hex = `#${sum.map((s) => hex2(s / n)).join('')}`;
  const lab = hexToLab(hex);
  return { id: randomUUID(), hex, lab, share: null, name: describeColor(lab).name, label };
}
