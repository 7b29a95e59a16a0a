import sharp from 'sharp';
import type { YarnCrop } from '@vatside/contracts/submissions';

// A viewer's skein photo for the demo, drawn in code: a twisted hank lying on a plain surface,
// its strands in the skein's colors. Written as a phone would, with camera EXIF, so the seed
// shows that the sharing pipeline strips it.

const WIDTH = 1200;
const HEIGHT = 900;

/** Where the skein lies in every demo photo, as the maker would mark it. */
export const SKEIN_AREA: YarnCrop = { x: 0.12, y: 0.22, width: 0.76, height: 0.56 };

export interface SkeinLook {
  /** Strand colors in order along the twist (variegated skeins have several). */
  yarn: string[];
  /** The table, towel or board under it. */
  surface: string;
  /** A dim photo (for the demo's "colors off in this light" skein). */
  dim?: boolean;
  /** A crop that misses most of the skein (for the demo's "yarn hard to see" skein). */
  farAway?: boolean;
}

/** The twist: two plies wrapped round each other, drawn as overlapping slanted loops. */
function skeinSvg(look: SkeinLook): string {
  const left = WIDTH * SKEIN_AREA.x + 60;
  const right = WIDTH * (SKEIN_AREA.x + SKEIN_AREA.width) - 60;
  const cy = HEIGHT * (SKEIN_AREA.y + SKEIN_AREA.height / 2);
  const twists = 7;
  const step = (right - left) / twists;
  const strands: string[] = [];
  for (let i = 0; i < twists; i++) {
    const cx = left + step * (i + 0.5);
    for (let ply = 0; ply < 2; ply++) {
      const color = look.yarn[(i * 2 + ply) % look.yarn.length]!;
      const angle = ply === 0 ? -32 : 32;
      strands.push(
        `<ellipse cx="${cx.toFixed(1)}" cy="${cy}" rx="${(step * 0.75).toFixed(1)}" ry="${(HEIGHT * 0.25).toFixed(1)}" transform="rotate(${angle} ${cx.toFixed(1)} ${cy})" fill="${color}" stroke="#00000033" stroke-width="3"/>`,
      );
      // Fine lines for the yarn's strands.
      for (let s = -4; s <= 4; s++) {
        strands.push(
          `<line x1="${(cx - step * 0.55).toFixed(1)}" y1="${cy + s * 14}" x2="${(cx + step * 0.55).toFixed(1)}" y2="${cy + s * 14}" transform="rotate(${angle} ${cx.toFixed(1)} ${cy})" stroke="#ffffff2a" stroke-width="3"/>`,
        );
      }
    }
  }
  // The loop at one end, where the hank folds back on itself.
  const loop = `<ellipse cx="${right + 30}" cy="${cy}" rx="80" ry="${HEIGHT * 0.17}" fill="none" stroke="${look.yarn[0]}" stroke-width="34"/>`;
  const dim = look.dim
    ? `<rect width="${WIDTH}" height="${HEIGHT}" fill="#000" opacity="0.62"/>`
    : '';
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}">
<rect width="${WIDTH}" height="${HEIGHT}" fill="${look.surface}"/>
<rect y="${HEIGHT * 0.86}" width="${WIDTH}" height="${HEIGHT * 0.14}" fill="#00000018"/>
<ellipse cx="${WIDTH / 2}" cy="${cy + HEIGHT * 0.24}" rx="${(right - left) / 2 + 60}" ry="28" fill="#0000002a"/>
${loop}${strands.join('')}${dim}</svg>`;
}

/** The photo as a phone's JPEG, with camera EXIF that must not survive sharing. */
export async function skeinPhotoJpeg(look: SkeinLook): Promise<Buffer> {
  return sharp(Buffer.from(skeinSvg(look)))
    .jpeg({ quality: 88 })
    .withExif({
      IFD0: { Make: 'Demo Phone', Model: 'Seed Camera', Software: 'vatside demo seed' },
    })
    .toBuffer();
}

/** The yarn area the maker marked: the skein, or (for the photo sent back) a corner of it. */
export const yarnCropFor = (look: SkeinLook): YarnCrop =>
  look.farAway ? { x: 0.02, y: 0.02, width: 0.2, height: 0.2 } : SKEIN_AREA;
