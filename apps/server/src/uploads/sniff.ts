import { fileTypeFromBuffer } from 'file-type';
import { HttpError } from '../http/errors.ts';

// What a file really is, from its bytes: the name and the declared type are the sender's word.

export const acceptedImageTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type AcceptedImageType = (typeof acceptedImageTypes)[number];

const isAccepted = (mime: string): mime is AcceptedImageType =>
  (acceptedImageTypes as readonly string[]).includes(mime);

/** The image type the bytes start with; anything but JPEG, PNG or WebP is refused with 415. */
export async function sniffImageType(bytes: Uint8Array): Promise<AcceptedImageType> {
  const found = await fileTypeFromBuffer(bytes);
  if (!found || !isAccepted(found.mime)) {
    throw new HttpError(
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      'This file is not a JPEG, PNG or WebP photo. Export or save it as one of those and try again.',
    );
  }
  return found.mime;
}

const u16 = (b: Uint8Array, at: number) => (b[at]! << 8) | b[at + 1]!;
const u32 = (b: Uint8Array, at: number) =>
  ((b[at]! << 24) >>> 0) + (b[at + 1]! << 16) + u16(b, at + 2);
const ascii = (b: Uint8Array, at: number, n: number) =>
  String.fromCharCode(...b.subarray(at, at + n));

/** PNG: chunks (length, type, data, CRC) up to IEND (ISO/IEC 15948, §5.3). */
function pngEnd(b: Uint8Array): number | undefined {
  for (let at = 8; at + 12 <= b.length;) {
    const next = at + 12 + u32(b, at);
    if (ascii(b, at + 4, 4) === 'IEND') return next;
    at = next;
  }
  return undefined;
}

/** WebP: a RIFF container whose header gives its size, padded to even (RFC 9649, §2.5). */
function webpEnd(b: Uint8Array): number | undefined {
  if (b.length < 12) return undefined;
  const size = b[4]! | (b[5]! << 8) | (b[6]! << 16) | ((b[7]! << 24) >>> 0);
  return 8 + size + (size % 2);
}

/** JPEG: marker segments, entropy-coded scans, then EOI (ITU-T T.81, Annex B). */
function jpegEnd(b: Uint8Array): number | undefined {
  let at = 2;
  while (at + 1 < b.length) {
    if (b[at] !== 0xff) return undefined;
    const marker = b[at + 1]!;
    if (marker === 0xff) {
      at += 1; // fill byte
    } else if (marker === 0xd9) {
      return at + 2;
    } else if ((marker >= 0xd0 && marker <= 0xd7) || marker === 0x01) {
      at += 2; // markers without a length
    } else {
      if (at + 3 >= b.length) return undefined;
      at += 2 + u16(b, at + 2);
      if (marker === 0xda) {
        // Scan data: 0xFF is followed by 0x00 (stuffing) or a restart marker until the next
        // marker. `indexOf` jumps from one 0xFF to the next natively: a byte-by-byte loop over a
        // phone photo's megabytes cost more than the header checks around it.
        for (;;) {
          at = b.indexOf(0xff, at);
          if (at === -1 || at + 1 >= b.length) return undefined;
          const next = b[at + 1]!;
          if (next !== 0x00 && !(next >= 0xd0 && next <= 0xd7)) break;
          at += 2;
        }
      }
    }
  }
  return undefined;
}

/**
 * Refuses an image with data after its end (a polyglot: the bytes decode as a picture but carry
 * a script, page or archive behind it). Zero padding, which some cameras write, is allowed.
 */
export function refuseTrailingData(bytes: Uint8Array, type: AcceptedImageType): void {
  const end =
    type === 'image/png' ? pngEnd(bytes) : type === 'image/webp' ? webpEnd(bytes) : jpegEnd(bytes);
  if (end === undefined || end > bytes.length) {
    throw new HttpError(
      422,
      'UNPROCESSABLE_IMAGE',
      'This image is cut off or damaged; save it again and upload that copy.',
    );
  }
  if (bytes.subarray(end).some((byte) => byte !== 0)) {
    throw new HttpError(
      422,
      'UNPROCESSABLE_IMAGE',
      'This image carries extra data after the picture, which can hide a script. Save the photo again (or take a screenshot) and upload that copy.',
    );
  }
}
