import {
  convertLab65ToRgb,
  convertRgbToLab65,
  differenceCiede2000,
  formatHex,
  type Lab65,
} from 'culori/fn';
import { DyeKitError, requireFinite } from './errors.ts';

/** CIELAB under D65 (CIE 15:2004): L* 0–100, a* and b* unbounded. */
export interface Lab {
  l: number;
  a: number;
  b: number;
}

const HEX = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i;

/** Parses "#rgb" or "#rrggbb" to sRGB channels in 0–1; throws INVALID_COLOR otherwise. */
export function hexToRgb(hex: string): { r: number; g: number; b: number } {
  const match = typeof hex === 'string' ? HEX.exec(hex.trim()) : null;
  if (!match?.[1]) {
    throw new DyeKitError(
      'INVALID_COLOR',
      `"${String(hex)}" is not a hex color like #3a7bd5.`,
      'hex',
    );
  }
  const digits = match[1].length === 3 ? [...match[1]].map((d) => d + d).join('') : match[1];
  const value = Number.parseInt(digits, 16);
  return { r: ((value >> 16) & 255) / 255, g: ((value >> 8) & 255) / 255, b: (value & 255) / 255 };
}

/** sRGB hex → CIELAB (D65), via culori's IEC 61966-2-1 transfer and CIE 15:2004 constants. */
export function hexToLab(hex: string): Lab {
  const { l, a, b } = convertRgbToLab65(hexToRgb(hex));
  return { l, a, b };
}

function toLab65(lab: Lab, field: string): Lab65 {
  if (lab === null || typeof lab !== 'object') {
    throw new DyeKitError('INVALID_COLOR', `${field} must be a CIELAB color { l, a, b }.`, field);
  }
  requireFinite(`${field}.l`, lab.l);
  requireFinite(`${field}.a`, lab.a);
  requireFinite(`${field}.b`, lab.b);
  return { mode: 'lab65', l: lab.l, a: lab.a, b: lab.b };
}

/** CIELAB (D65) → sRGB hex; colors outside the sRGB gamut are clipped per channel. */
export function labToHex(lab: Lab): string {
  return formatHex(convertLab65ToRgb(toLab65(lab, 'lab')));
}

const ciede2000 = differenceCiede2000();

/** CIEDE2000 color difference with kL = kC = kH = 1 (Sharma, Wu & Dalal 2005). */
export function deltaE2000(lab1: Lab, lab2: Lab): number {
  return ciede2000(toLab65(lab1, 'lab1'), toLab65(lab2, 'lab2'));
}

/** CIELAB chroma C*ab and hue angle h_ab in degrees [0, 360) (CIE 15:2004). */
export function labToLch(lab: Lab): { l: number; c: number; h: number } {
  const { l, a, b } = toLab65(lab, 'lab');
  const h = (Math.atan2(b, a) * 180) / Math.PI;
  return { l, c: Math.hypot(a, b), h: h < 0 ? h + 360 : h };
}

/**
 * Single-constant Kubelka–Munk: K/S = (1 − R)² / 2R for reflectance R in (0, 1]
 * (Kubelka & Munk 1931; as used in textile color matching).
 */
export function ksFromReflectance(r: number): number {
  requireFinite('reflectance', r);
  if (r <= 0 || r > 1) {
    throw new DyeKitError('INVALID_AMOUNT', 'Reflectance must be in (0, 1].', 'reflectance');
  }
  return (1 - r) ** 2 / (2 * r);
}

/** Inverse of Kubelka–Munk: R = 1 + K/S − √((K/S)² + 2·K/S), for K/S ≥ 0. */
export function reflectanceFromKs(ks: number): number {
  requireFinite('ks', ks);
  if (ks < 0) {
    throw new DyeKitError('INVALID_AMOUNT', 'K/S cannot be negative.', 'ks');
  }
  return 1 + ks - Math.sqrt(ks * ks + 2 * ks);
}

// Fast path for images: sRGB bytes → CIELAB (D65) with a 256-entry linearization table.
// Same formulas as culori (IEC 61966-2-1 transfer, CSS Color 4 matrix, CIE 15:2004 ε and κ);
// the tests hold the two together.
const SRGB_TO_LINEAR = new Float64Array(256);
for (let i = 0; i < 256; i++) {
  const c = i / 255;
  SRGB_TO_LINEAR[i] = c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;
// D65 white from its chromaticity (0.3127, 0.3290), as culori and the CSS Color 4 sample code.
const WHITE_X = 0.3127 / 0.329;
const WHITE_Z = (1 - 0.3127 - 0.329) / 0.329;

function labF(t: number): number {
  return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
}

/** Writes the CIELAB of one sRGB byte triple into `out` at `offset` (l, a, b). */
export function srgbBytesToLab(
  r: number,
  g: number,
  b: number,
  out: Float64Array,
  offset: number,
): void {
  const lr = SRGB_TO_LINEAR[r]!;
  const lg = SRGB_TO_LINEAR[g]!;
  const lb = SRGB_TO_LINEAR[b]!;
  const x = 0.4123907992659593 * lr + 0.357584339383878 * lg + 0.1804807884018343 * lb;
  const y = 0.2126390058715102 * lr + 0.715168678767756 * lg + 0.0721923153607337 * lb;
  const z = 0.0193308187155918 * lr + 0.119194779794626 * lg + 0.9505321522496607 * lb;
  const fx = labF(x / WHITE_X);
  const fy = labF(y);
  const fz = labF(z / WHITE_Z);
  out[offset] = 116 * fy - 16;
  out[offset + 1] = 500 * (fx - fy);
  out[offset + 2] = 200 * (fy - fz);
}
