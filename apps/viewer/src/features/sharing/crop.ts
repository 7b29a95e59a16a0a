import type { YarnCrop } from '@vatside/contracts/submissions';

// The yarn area as a rectangle in fractions of the photo: moved and resized by drag, keys or
// buttons, always kept inside the photo and never smaller than a tenth of a side.

export const MIN_SIDE = 0.1;
/** Where the box starts: the middle of the photo, where people put the skein. */
export const MIDDLE_AREA: YarnCrop = { x: 0.2, y: 0.2, width: 0.6, height: 0.6 };

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
const round = (v: number) => Math.round(v * 10_000) / 10_000;

/** Rounded to four places without leaving the photo (the server allows no overhang). */
export function tidyCrop(c: YarnCrop): YarnCrop {
  const width = round(clamp(c.width, MIN_SIDE, 1));
  const height = round(clamp(c.height, MIN_SIDE, 1));
  return {
    x: round(clamp(c.x, 0, 1 - width)),
    y: round(clamp(c.y, 0, 1 - height)),
    width,
    height,
  };
}

export function moveCrop(c: YarnCrop, dx: number, dy: number): YarnCrop {
  return tidyCrop({
    ...c,
    x: clamp(c.x + dx, 0, 1 - c.width),
    y: clamp(c.y + dy, 0, 1 - c.height),
  });
}

export type Corner = 'topLeft' | 'bottomRight';

/** Drags one corner; the opposite corner stays where it is. */
export function resizeCrop(c: YarnCrop, corner: Corner, dx: number, dy: number): YarnCrop {
  if (corner === 'bottomRight') {
    return tidyCrop({
      ...c,
      width: clamp(c.width + dx, MIN_SIDE, 1 - c.x),
      height: clamp(c.height + dy, MIN_SIDE, 1 - c.y),
    });
  }
  const right = c.x + c.width;
  const bottom = c.y + c.height;
  const x = clamp(c.x + dx, 0, right - MIN_SIDE);
  const y = clamp(c.y + dy, 0, bottom - MIN_SIDE);
  return tidyCrop({ x, y, width: right - x, height: bottom - y });
}

/** Grows or shrinks about the center, e.g. 1.2 or 1 / 1.2. */
export function scaleCrop(c: YarnCrop, factor: number): YarnCrop {
  const width = clamp(c.width * factor, MIN_SIDE, 1);
  const height = clamp(c.height * factor, MIN_SIDE, 1);
  const cx = c.x + c.width / 2;
  const cy = c.y + c.height / 2;
  return tidyCrop({ x: cx - width / 2, y: cy - height / 2, width, height });
}
