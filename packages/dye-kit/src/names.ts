import { labToLch, type Lab } from './color.ts';

// Readable color names in the manner of the ISCC–NBS system of color designation (Kelly & Judd,
// NBS Special Publication 440, 1976): a hue name with a lightness/chroma modifier ("light
// grayish blue"), neutrals from white to black. This is an approximation of the ISCC–NBS
// categories: the hue sectors are CIELAB (D65) hue angles and the modifiers are bands of L* and
// C*ab chosen to follow the ISCC–NBS layout, not the Munsell block boundaries themselves.

export type HueName =
  | 'red'
  | 'pink'
  | 'orange'
  | 'brown'
  | 'yellow'
  | 'olive'
  | 'yellow green'
  | 'green'
  | 'bluish green'
  | 'blue'
  | 'violet'
  | 'purple'
  | 'neutral';

export interface ColorDescription {
  /** e.g. "light grayish blue", "white", "bluish gray". */
  name: string;
  hue: HueName;
  /** e.g. "vivid", "light grayish"; null for neutrals and "-ish gray" names. */
  modifier: string | null;
}

/** Hue sectors by CIELAB hue angle h_ab in degrees: [start, end). Red wraps through 0°. */
const HUE_SECTORS: ReadonlyArray<{ from: number; hue: HueName }> = [
  { from: 0, hue: 'red' },
  { from: 45, hue: 'orange' },
  { from: 75, hue: 'yellow' },
  { from: 110, hue: 'yellow green' },
  { from: 130, hue: 'green' },
  { from: 175, hue: 'bluish green' },
  { from: 200, hue: 'blue' },
  { from: 310, hue: 'violet' },
  { from: 322, hue: 'purple' },
  { from: 350, hue: 'red' },
];

const GRAY_ADJECTIVE: Record<HueName, string> = {
  red: 'reddish',
  pink: 'pinkish',
  orange: 'brownish',
  brown: 'brownish',
  yellow: 'yellowish',
  olive: 'olive',
  'yellow green': 'greenish',
  green: 'greenish',
  'bluish green': 'greenish',
  blue: 'bluish',
  violet: 'purplish',
  purple: 'purplish',
  neutral: '',
};

function baseHue(h: number): HueName {
  let hue: HueName = 'red';
  for (const sector of HUE_SECTORS) if (h >= sector.from) hue = sector.hue;
  return hue;
}

/** ISCC–NBS derives pink, brown and olive from light reds and dark oranges and yellows. */
function derivedHue(hue: HueName, l: number, c: number, h: number): HueName {
  const reddish = h >= 335 || h < 45;
  if (reddish && l >= 60 && c < 70) return 'pink';
  const muted = c < 35 && l < 85;
  if (hue === 'orange' && (l < 55 || muted)) return 'brown';
  if (hue === 'yellow' && h < 90 && (l < 50 || muted)) return 'brown';
  if ((hue === 'yellow' || hue === 'yellow green') && l < 55) return 'olive';
  return hue;
}

function modifierFor(l: number, c: number): string {
  if (c >= 70) return l >= 30 ? 'vivid' : 'deep';
  if (c >= 45) return l >= 70 ? 'brilliant' : l >= 40 ? 'strong' : 'deep';
  if (c >= 25) return l >= 75 ? 'light' : l >= 50 ? 'moderate' : l >= 30 ? 'dark' : 'very dark';
  if (l >= 80) return 'pale';
  if (l >= 60) return 'light grayish';
  return l >= 35 ? 'grayish' : 'dark grayish';
}

function neutralName(l: number): string {
  if (l >= 92) return 'white';
  if (l >= 75) return 'light gray';
  if (l >= 50) return 'medium gray';
  if (l >= 25) return 'dark gray';
  return 'black';
}

/** A readable name for a CIELAB (D65) color, approximating the ISCC–NBS categories. */
export function describeColor(lab: Lab): ColorDescription {
  const { l, c, h } = labToLch(lab);
  if (c < 5 || (l < 10 && c < 20)) {
    return { name: neutralName(l), hue: 'neutral', modifier: null };
  }
  const hue = derivedHue(baseHue(h), l, c, h);
  if (c < 12) {
    const lightness = l >= 80 ? 'light ' : l < 35 ? 'dark ' : '';
    return { name: `${lightness}${GRAY_ADJECTIVE[hue]} gray`, hue, modifier: null };
  }
  const modifier = modifierFor(l, c);
  return { name: `${modifier} ${hue}`, hue, modifier };
}
