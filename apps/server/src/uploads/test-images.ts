import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';

// Images generated in code for the pipeline's tests (no files downloaded or checked in).

export const TIDE_BANDS = ['#1f6f78', '#d9c8a0', '#b5532b'] as const;

/** Three vertical bands of known colors (a rock pool's water, sand and rust), as PNG. */
export async function bandedPng(width = 300, height = 120): Promise<Buffer> {
  const bandWidth = Math.ceil(width / TIDE_BANDS.length);
  const band = (hex: string) =>
    sharp({ create: { width: bandWidth, height, channels: 3, background: hex } })
      .png()
      .toBuffer();
  const parts = await Promise.all(TIDE_BANDS.map(band));
  return sharp({ create: { width, height, channels: 3, background: '#000000' } })
    .composite(parts.map((input, i) => ({ input, left: i * bandWidth, top: 0 })))
    .png()
    .toBuffer();
}

/** A JPEG that says where it was taken (GPS), by which camera, and that it lies on its side. */
export async function jpegWithGps(width = 80, height = 40): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#1f6f78' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Invented Camera Co', Copyright: 'Invented Person' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '44/1 30/1 0/1',
        GPSLongitudeRef: 'W',
        GPSLongitude: '68/1 12/1 0/1',
      },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A Display-P3 PNG (P3 ICC profile embedded) of an sRGB color, as a phone would store it. */
export async function displayP3Png(srgbHex: string, size = 64): Promise<Buffer> {
  return sharp({ create: { width: size, height: size, channels: 3, background: srgbHex } })
    .withIccProfile('p3')
    .png()
    .toBuffer();
}

const chunk = (type: string, data: Buffer) => {
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const head = Buffer.alloc(4);
  head.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([head, body, crc]);
};

/**
 * A PNG of a few hundred bytes whose header declares `width` × `height` pixels (a decompression
 * bomb's calling card); its pixel data is a few empty rows, never reached if the limit holds.
 */
export function pngDeclaring(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, deflate, no filter, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(4 * (width * 3 + 1)))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A PNG with a text chunk holding a script: valid, but the script must not survive. */
export async function pngWithScriptInText(): Promise<Buffer> {
  const png = await bandedPng(60, 30);
  const iend = png.length - 12;
  const text = chunk('tEXt', Buffer.from('Comment\0<script>alert("hidden")</script>', 'latin1'));
  return Buffer.concat([png.subarray(0, iend), text, png.subarray(iend)]);
}

export const HIDDEN_SCRIPT = '<html><script>fetch("/api/me")</script></html>';

export const svgImage = Buffer.from(
  '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10" fill="#1f6f78"/></svg>',
);

export const notAnImage = Buffer.from('These are my dye notes, not a photo.\n'.repeat(20));
