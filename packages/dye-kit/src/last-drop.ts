import { convertLrgbToRgb, convertRgbToLrgb, formatHex } from 'culori/fn';
import {
  hexToLab,
  hexToRgb,
  ksFromReflectance,
  labToLch,
  reflectanceFromKs,
  type Lab,
} from './color.ts';
import { depthOfShade, dyeMassInStockG } from './dye.ts';
import { DyeKitError, requireNonNegative, requirePositive } from './errors.ts';
import { describeColor } from './names.ts';
import type { DyeKitWarning } from './warning.ts';

export interface Leftover {
  /** Strength of the leftover stock, % w/v. */
  stockStrengthPct: number;
  volumeMl: number;
  /** The color it dyes, as sRGB hex, for the mix preview. */
  color?: string;
}

export interface LastDropInput {
  leftovers: Leftover[];
  /** Dry weight of the skein to dye, g. */
  weightOfGoodsG: number;
  /** Liquid to spread over the skein, mL; defaults to 7 mL per gram of fiber. */
  targetSpreadVolumeMl?: number;
}

export interface MixPreview {
  hex: string;
  lab: Lab;
  name: string;
  /** Always true: an approximate preview, not a prediction of the dyed skein. */
  approximate: true;
}

export interface LastDrop {
  totalDyeMassG: number;
  totalVolumeMl: number;
  /** Strength of all leftovers poured together, % w/v. */
  combinedStrengthPct: number;
  /** What the dye mass gives on this skein; dilution does not change it. */
  depthOfShadePct: number;
  spread: {
    targetVolumeMl: number;
    /** Water to add to the combined leftovers (0 when there is already enough liquid). */
    waterToAddMl: number;
    /** Strength after dilution, % w/v. */
    dilutedStrengthPct: number;
  };
  /** Present when every leftover has a color. */
  mixPreview: MixPreview | null;
  warnings: DyeKitWarning[];
}

/** Common-practice example: about 700 mL of liquid spreads leftovers over a 100 g skein. */
const DEFAULT_SPREAD_ML_PER_G = 7;
/** Above about 4 % DOS, wool does not exhaust (common practice). */
const MAX_EXHAUSTING_DOS_PCT = 4;
/** A dyed fiber still reflects a little of every channel; keeps K/S finite for pure colors. */
const REFLECTANCE_FLOOR = 0.01;
/** A mix under half the mean chroma of its parts reads as muddy (a product choice). */
const MUDDY_CHROMA_RATIO = 0.5;
/** Grays mixed with grays are not "muddy": only check when the parts have some chroma. */
const MIN_CHROMA_FOR_MUD_CHECK = 15;

/**
 * Approximate preview of dyes mixed in a bath: single-constant Kubelka–Munk, K/S additive in
 * concentration (Kubelka & Munk 1931), applied per linear-sRGB channel as a stand-in for
 * reflectance and weighted by each dye's mass. A preview, not a color match.
 */
export function mixPreview(parts: ReadonlyArray<{ color: string; weight: number }>): MixPreview {
  parts.forEach((p, i) => requireNonNegative(`parts[${i}].weight`, p.weight));
  const total = parts.reduce((sum, p) => sum + p.weight, 0);
  if (parts.length === 0 || !(total > 0)) {
    throw new DyeKitError(
      'INVALID_AMOUNT',
      'A mix needs at least one part with some dye in it.',
      'leftovers',
    );
  }
  const ks = { r: 0, g: 0, b: 0 };
  for (const part of parts) {
    const linear = convertRgbToLrgb(hexToRgb(part.color));
    for (const channel of ['r', 'g', 'b'] as const) {
      const reflectance = Math.max(REFLECTANCE_FLOOR, linear[channel]);
      ks[channel] += (part.weight / total) * ksFromReflectance(reflectance);
    }
  }
  const hex = formatHex(
    convertLrgbToRgb({
      r: reflectanceFromKs(ks.r),
      g: reflectanceFromKs(ks.g),
      b: reflectanceFromKs(ks.b),
    }),
  );
  const lab = hexToLab(hex);
  return { hex, lab, name: describeColor(lab).name, approximate: true };
}

/**
 * Leftover stocks for a "last drop" skein: total dye mass sets how deep the color gets, the
 * volume sets how far it spreads (common practice).
 */
export function lastDrop(input: LastDropInput): LastDrop {
  const { leftovers, weightOfGoodsG } = input;
  requirePositive('weightOfGoodsG', weightOfGoodsG);
  if (!Array.isArray(leftovers as unknown) || leftovers.length === 0) {
    throw new DyeKitError('INVALID_AMOUNT', 'List at least one leftover stock.', 'leftovers');
  }
  const masses = leftovers.map((l, i) => {
    requirePositive(`leftovers[${i}].volumeMl`, l.volumeMl);
    return dyeMassInStockG({ stockStrengthPct: l.stockStrengthPct, volumeMl: l.volumeMl });
  });
  const totalDyeMassG = masses.reduce((sum, m) => sum + m, 0);
  const totalVolumeMl = leftovers.reduce((sum, l) => sum + l.volumeMl, 0);
  const targetVolumeMl = requirePositive(
    'targetSpreadVolumeMl',
    input.targetSpreadVolumeMl ?? weightOfGoodsG * DEFAULT_SPREAD_ML_PER_G,
  );
  const spreadVolumeMl = Math.max(targetVolumeMl, totalVolumeMl);
  const depthOfShadePct = depthOfShade({ dyeMassG: totalDyeMassG, weightOfGoodsG });
  const warnings: DyeKitWarning[] = [];

  if (depthOfShadePct > MAX_EXHAUSTING_DOS_PCT) {
    warnings.push({
      code: 'DEPTH_OF_SHADE_HIGH',
      severity: 'warning',
      message: `These leftovers come to ${depthOfShadePct.toFixed(1)} % depth of shade, more than the skein can take up (about 4 %): the rest will rinse out. Add a second skein or save some for later.`,
    });
  }
  if (totalVolumeMl >= targetVolumeMl) {
    warnings.push({
      code: 'ALREADY_DILUTE',
      severity: 'info',
      message: 'There is already enough liquid to reach the whole skein; no water to add.',
    });
  }

  let preview: MixPreview | null = null;
  if (leftovers.every((l) => l.color !== undefined)) {
    const parts = leftovers.map((l, i) => ({ color: l.color!, weight: masses[i]! }));
    preview = mixPreview(parts);
    const meanChroma =
      parts.reduce((sum, p) => sum + labToLch(hexToLab(p.color)).c * p.weight, 0) / totalDyeMassG;
    const mixChroma = labToLch(preview.lab).c;
    if (meanChroma >= MIN_CHROMA_FOR_MUD_CHECK && mixChroma < MUDDY_CHROMA_RATIO * meanChroma) {
      warnings.push({
        code: 'MIX_MAY_BE_MUDDY',
        severity: 'info',
        message: `Mixed in one bath, these colors lean toward a muddy ${preview.name}. For brighter color, pour them onto separate sections of the skein instead of mixing them.`,
      });
    }
  }

  return {
    totalDyeMassG,
    totalVolumeMl,
    combinedStrengthPct: (totalDyeMassG / totalVolumeMl) * 100,
    depthOfShadePct,
    spread: {
      targetVolumeMl: spreadVolumeMl,
      waterToAddMl: spreadVolumeMl - totalVolumeMl,
      dilutedStrengthPct: (totalDyeMassG / spreadVolumeMl) * 100,
    },
    mixPreview: preview,
    warnings,
  };
}
