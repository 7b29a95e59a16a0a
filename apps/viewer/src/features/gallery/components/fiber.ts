import type { GallerySkein } from '@vatside/contracts/gallery';

/** "75 % wool, 25 % nylon" */
export const fiberWords = (fibers: GallerySkein['fiberContent']) =>
  fibers.map((f) => `${f.pct} % ${f.fiber}`).join(', ');
