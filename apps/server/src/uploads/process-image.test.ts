import exifr from 'exifr';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import { HttpError } from '../http/errors.ts';
import { processImage, swatchAt, THUMB_MAX_PX, WEB_MAX_PX } from './process-image.ts';
import {
  HIDDEN_SCRIPT,
  TIDE_BANDS,
  bandedPng,
  displayP3Png,
  jpegWithGps,
  notAnImage,
  pngDeclaring,
  pngWithScriptInText,
  svgImage,
} from './test-images.ts';

const options = { maxPixels: 50_000_000, swatchCount: 6 };

async function refusal(bytes: Uint8Array): Promise<HttpError> {
  const error = await processImage(bytes, options).then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(HttpError);
  return error as HttpError;
}

/** Display P3 → sRGB: CSS Color Module Level 4, §18 sample code (P3 and sRGB share the curve). */
function displayP3ToSrgb([r, g, b]: number[]): number[] {
  const lin = (v: number) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
  const enc = (v: number) => (v <= 0.0031308 ? 12.92 * v : 1.055 * v ** (1 / 2.4) - 0.055);
  const [lr, lg, lb] = [r!, g!, b!].map((v) => lin(v / 255));
  // linear Display P3 → linear sRGB (the product of the spec's P3→XYZ and XYZ→sRGB matrices)
  const out = [
    1.2249401 * lr! - 0.2249404 * lg! + 0.0 * lb!,
    -0.0420569 * lr! + 1.0420571 * lg! + 0.0 * lb!,
    -0.0196376 * lr! - 0.0786361 * lg! + 1.0982735 * lb!,
  ];
  return out.map((v) => Math.round(255 * enc(Math.min(1, Math.max(0, v)))));
}

describe('upload pipeline: what comes out', () => {
  it('strips every piece of metadata (GPS above all) and applies the orientation', async () => {
    const input = await jpegWithGps(80, 40);
    // The input really carries what must go.
    expect(await exifr.gps(input)).toMatchObject({ latitude: 44.5 });
    expect((await sharp(input).metadata()).orientation).toBe(6);

    const { web, thumb } = await processImage(input, options);
    for (const out of [web, thumb]) {
      expect(await exifr.parse(out.data, true)).toBeUndefined();
      const meta = await sharp(out.data).metadata();
      expect([meta.exif, meta.icc, meta.xmp, meta.iptc, meta.orientation]).toEqual([
        undefined,
        undefined,
        undefined,
        undefined,
        undefined,
      ]);
      expect(meta.format).toBe('jpeg');
    }
    // Orientation 6 means "rotate 90° clockwise to view": 80 × 40 stands up as 40 × 80.
    expect([web.width, web.height]).toEqual([40, 80]);
  });

  it('converts a Display-P3 photo to sRGB and drops the profile', async () => {
    const input = await displayP3Png('#00c800');
    const stored = await sharp(input).keepIccProfile().raw().toBuffer();
    const p3Bytes = [stored[0]!, stored[1]!, stored[2]!];
    const expected = displayP3ToSrgb(p3Bytes);
    // A pipeline that ignored the profile would keep the P3 numbers, far from the sRGB ones.
    expect(Math.abs(p3Bytes[0]! - expected[0]!)).toBeGreaterThan(40);

    const { web } = await processImage(input, options);
    const meta = await sharp(web.data).metadata();
    expect(meta.icc).toBeUndefined();
    expect(meta.space).toBe('srgb');
    const px = await sharp(web.data).raw().toBuffer();
    [0, 1, 2].forEach((c) => expect(Math.abs(px[c]! - expected[c]!)).toBeLessThanOrEqual(4));
  });

  it('makes a web rendition and a thumbnail no larger than their bounds', async () => {
    const big = await sharp({
      create: { width: 2400, height: 1200, channels: 3, background: '#d9c8a0' },
    })
      .png()
      .toBuffer();
    const { web, thumb } = await processImage(big, options);
    expect([web.width, web.height]).toEqual([WEB_MAX_PX, WEB_MAX_PX / 2]);
    expect([thumb.width, thumb.height]).toEqual([THUMB_MAX_PX, THUMB_MAX_PX / 2]);
    expect(web.contentType).toBe('image/jpeg');
  });

  it('extracts the palette with dye-kit: each band is a swatch with about a third of the image', async () => {
    const { palette } = await processImage(await bandedPng(), options);
    for (const hex of TIDE_BANDS) {
      const match = palette.find((s) => deltaE2000(s.lab, hexToLab(hex)) < 3);
      expect(match, hex).toBeDefined();
      expect(match!.share).toBeGreaterThan(0.28);
      expect(match!.name.length).toBeGreaterThan(2);
      expect(match!.label).toBe('');
    }
  });

  it('samples the color under a picked point', async () => {
    const { web } = await processImage(await bandedPng(), options);
    const right = await swatchAt(web.data, 0.9, 0.5, 'Rust');
    expect(deltaE2000(right.lab, hexToLab(TIDE_BANDS[2]))).toBeLessThan(3);
    expect(right).toMatchObject({ share: null, label: 'Rust' });
  });

  it('re-encodes: a script hidden in a PNG text chunk does not reach the rendition', async () => {
    const input = await pngWithScriptInText();
    expect(input.includes('<script>')).toBe(true);
    const { web, thumb } = await processImage(input, options);
    expect(web.data.includes('<script>')).toBe(false);
    expect(thumb.data.includes('<script>')).toBe(false);
  });

  it('allows zero padding after the image end (some cameras write it)', async () => {
    const padded = Buffer.concat([await jpegWithGps(), Buffer.alloc(64)]);
    await expect(processImage(padded, options)).resolves.toBeDefined();
  });
});

describe('upload pipeline: refusals', () => {
  it('a text file is not an image, whatever its name says → 415', async () => {
    const error = await refusal(notAnImage);
    expect([error.status, error.code]).toEqual([415, 'UNSUPPORTED_MEDIA_TYPE']);
    expect(error.message).toMatch(/JPEG, PNG or WebP/);
  });

  it('an SVG (markup that can carry script) → 415', async () => {
    expect((await refusal(svgImage)).status).toBe(415);
  });

  it('a polyglot PNG (valid image, then HTML and script after IEND) → 422', async () => {
    const polyglot = Buffer.concat([await bandedPng(60, 30), Buffer.from(HIDDEN_SCRIPT)]);
    const error = await refusal(polyglot);
    expect([error.status, error.code]).toEqual([422, 'UNPROCESSABLE_IMAGE']);
    expect(error.message).toMatch(/extra data after the picture/);
  });

  it('a polyglot JPEG (script after the end-of-image marker) → 422', async () => {
    const polyglot = Buffer.concat([await jpegWithGps(), Buffer.from(HIDDEN_SCRIPT)]);
    expect((await refusal(polyglot)).status).toBe(422);
  });

  it('a polyglot WebP (bytes beyond its RIFF size) → 422', async () => {
    const webp = await sharp(await bandedPng(60, 30))
      .webp()
      .toBuffer();
    expect((await refusal(Buffer.concat([webp, Buffer.from(HIDDEN_SCRIPT)]))).status).toBe(422);
  });

  it('a tiny PNG declaring 30000 × 30000 pixels is refused from its header → 422', async () => {
    const bomb = pngDeclaring(30_000, 30_000);
    expect(bomb.length).toBeLessThan(2_000);
    const error = await refusal(bomb);
    expect([error.status, error.code]).toEqual([422, 'UNPROCESSABLE_IMAGE']);
    expect(error.message).toMatch(/30000 × 30000 pixels/);
  });

  it('a truncated JPEG → 422', async () => {
    const whole = await sharp(await bandedPng())
      .jpeg()
      .toBuffer();
    expect((await refusal(whole.subarray(0, Math.floor(whole.length / 2)))).status).toBe(422);
  });
});
