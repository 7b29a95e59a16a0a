import type { Page } from 'playwright-core';
import { crc32, deflateSync } from 'node:zlib';

/** A minimal 8-bit RGB PNG (W3C PNG specification §5, §9): chunks with CRC, filter 0 rows. */
export function encodePng(w: number, h: number, pixel: (x: number, y: number) => number[]): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const out = Buffer.alloc(8 + body.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc32(body), 4 + body.length);
    return out;
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(w, 0);
  header.writeUInt32BE(h, 4);
  header.set([8, 2, 0, 0, 0], 8); // bit depth 8, truecolor
  const rows = Buffer.alloc(h * (1 + w * 3));
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) rows.set(pixel(x, y), y * (1 + w * 3) + 1 + x * 3);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A skein photo drawn on the phone's canvas: the yarn fills the middle, a pale cloth around. */
export async function drawSkeinJpeg(page: Page, hex: string): Promise<Buffer> {
  const dataUrl = await page.evaluate((yarn) => {
    const canvas = document.createElement('canvas');
    canvas.width = 1200;
    canvas.height = 900;
    const ctx = canvas.getContext('2d')!;
    ctx.fillStyle = '#e8e4dc';
    ctx.fillRect(0, 0, 1200, 900);
    ctx.fillStyle = yarn;
    ctx.fillRect(150, 120, 900, 660);
    return canvas.toDataURL('image/jpeg', 0.92);
  }, hex);
  return Buffer.from(dataUrl.split(',')[1]!, 'base64');
}
