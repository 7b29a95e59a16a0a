import { describe, expect, it } from 'vitest';
import { yarnCropSchema } from '@vatside/contracts/submissions';
import { MIDDLE_AREA, moveCrop, resizeCrop, scaleCrop, tidyCrop } from './crop.ts';

// Plain rectangle geometry, worked by hand; every result must also pass the server's schema.

describe('the yarn area box', () => {
  it('moves but never leaves the photo', () => {
    expect(moveCrop(MIDDLE_AREA, 0.1, -0.05)).toEqual({ x: 0.3, y: 0.15, width: 0.6, height: 0.6 });
    expect(moveCrop(MIDDLE_AREA, 0.5, 0.5)).toEqual({ x: 0.4, y: 0.4, width: 0.6, height: 0.6 });
    expect(moveCrop(MIDDLE_AREA, -1, -1)).toEqual({ x: 0, y: 0, width: 0.6, height: 0.6 });
  });

  it('resizes from either corner, the opposite corner staying put, never below a tenth', () => {
    expect(resizeCrop(MIDDLE_AREA, 'bottomRight', 0.1, -0.2)).toEqual({
      x: 0.2,
      y: 0.2,
      width: 0.7,
      height: 0.4,
    });
    expect(resizeCrop(MIDDLE_AREA, 'bottomRight', 0.5, -0.9)).toEqual({
      x: 0.2,
      y: 0.2,
      width: 0.8,
      height: 0.1,
    });
    // Top-left dragged past the bottom-right corner stops a tenth short of it (0.8 − 0.1).
    expect(resizeCrop(MIDDLE_AREA, 'topLeft', 0.9, 0.1)).toEqual({
      x: 0.7,
      y: 0.3,
      width: 0.1,
      height: 0.5,
    });
  });

  it('grows about its center and stops at the edges', () => {
    expect(scaleCrop(MIDDLE_AREA, 1.2)).toEqual({ x: 0.14, y: 0.14, width: 0.72, height: 0.72 });
    expect(scaleCrop({ x: 0.5, y: 0.5, width: 0.5, height: 0.5 }, 2)).toEqual({
      x: 0,
      y: 0,
      width: 1,
      height: 1,
    });
  });

  it('rounds to four places inside the photo, as the server wants it', () => {
    const odd = tidyCrop({ x: 1 / 3, y: 2 / 3, width: 2 / 3, height: 1 / 3 });
    expect(odd).toEqual({ x: 0.3333, y: 0.6667, width: 0.6667, height: 0.3333 });
    expect(yarnCropSchema.safeParse(odd).success).toBe(true);
  });
});
