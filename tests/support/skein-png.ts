import { crc32, deflateSync } from 'node:zlib';

// A small skein photo for the end-to-end tests, written as a PNG by hand (the PNG spec's
// chunks: IHDR, IDAT, IEND; RFC 2083): the yarn color on the left half, a plain table on the
// right, so the yarn area can be marked as the left half.

function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

export function skeinPng(yarnHex: string, tableHex = '#efe7d6', width = 240, height = 160) {
  const [yarn, table] = [rgb(yarnHex), rgb(tableHex)];
  const rows = Array.from({ length: height }, () =>
    Buffer.from([
      0,
      ...Array.from({ length: width }, (_, x) => (x < width / 2 ? yarn : table)).flat(),
    ]),
  );
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit truecolor, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(Buffer.concat(rows))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
