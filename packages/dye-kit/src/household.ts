import { requireNonNegative, DyeKitError } from './errors.ts';
import {
  METRIC_CUP_ML,
  METRIC_TBSP_ML,
  METRIC_TSP_ML,
  US_CUP_ML,
  US_TBSP_ML,
  US_TSP_ML,
} from './units.ts';

/** `us`: NIST customary spoons and cup; `metric`: 5 mL tsp, 15 mL tbsp, 250 mL cup. */
export type MeasureSystem = 'us' | 'metric';

export interface HouseholdPart {
  unit: 'cup' | 'tbsp' | 'tsp';
  /** e.g. 1.5 for "1 ½ tsp". */
  amount: number;
  label: string;
}

export interface HouseholdMeasure {
  system: MeasureSystem;
  parts: HouseholdPart[];
  /** Friendly text, e.g. "2 tbsp + 1 ½ tsp". */
  label: string;
  /** What the spoons and cups actually hold. */
  measuredMl: number;
  /** measuredMl − requested mL. */
  roundingErrorMl: number;
  /** Rounding error relative to the requested amount (0 when nothing was requested). */
  roundingErrorPct: number;
  /** True when the amount is under half the smallest spoon (⅛ tsp) and rounds to nothing. */
  tooSmallToMeasure: boolean;
}

const SPOONS: Record<MeasureSystem, { tspMl: number; tbspMl: number; cupMl: number }> = {
  us: { tspMl: US_TSP_ML, tbspMl: US_TBSP_ML, cupMl: US_CUP_ML },
  metric: { tspMl: METRIC_TSP_ML, tbspMl: METRIC_TBSP_ML, cupMl: METRIC_CUP_ML },
};

/** Cup fractions a kitchen set measures; ⅔ and ¾ take two scoops (⅓+⅓, ½+¼). */
const CUP_FRACTIONS: ReadonlyArray<{ value: number; glyph: string; scoops: number }> = [
  { value: 0, glyph: '', scoops: 0 },
  { value: 1 / 4, glyph: '¼', scoops: 1 },
  { value: 1 / 3, glyph: '⅓', scoops: 1 },
  { value: 1 / 2, glyph: '½', scoops: 1 },
  { value: 2 / 3, glyph: '⅔', scoops: 2 },
  { value: 3 / 4, glyph: '¾', scoops: 2 },
];

/** Eighths of a teaspoon with a spoon set of 1, ½, ¼ and ⅛ tsp: glyph and scoops needed. */
const TSP_EIGHTHS: ReadonlyArray<{ glyph: string; scoops: number }> = [
  { glyph: '', scoops: 0 },
  { glyph: '⅛', scoops: 1 },
  { glyph: '¼', scoops: 1 },
  { glyph: '⅜', scoops: 2 },
  { glyph: '½', scoops: 1 },
  { glyph: '⅝', scoops: 2 },
  { glyph: '¾', scoops: 2 },
  { glyph: '⅞', scoops: 3 },
];

/** From this many cups on, spoons no longer matter: round to the nearest cup fraction. */
const CUPS_ONLY_FROM = 4;

/** The smallest amount a home spoon set measures (⅛ tsp) in mL. */
export function smallestMeasureMl(system: MeasureSystem): number {
  return spoonVolumes(system).tspMl / 8;
}

/** Teaspoon, tablespoon and cup of a measuring system, mL. */
export function spoonVolumes(system: MeasureSystem): {
  tspMl: number;
  tbspMl: number;
  cupMl: number;
} {
  const spoons = SPOONS[system];
  if (spoons === undefined) {
    throw new DyeKitError(
      'INVALID_OPTION',
      `Unknown measuring system "${String(system)}".`,
      'system',
    );
  }
  return spoons;
}

function withFraction(whole: number, glyph: string): string {
  if (whole === 0) return glyph;
  return glyph === '' ? String(whole) : `${whole} ${glyph}`;
}

interface Candidate {
  parts: HouseholdPart[];
  measuredMl: number;
  scoops: number;
  cupMl: number;
}

function cupPart(whole: number, fraction: (typeof CUP_FRACTIONS)[number]): HouseholdPart[] {
  const amount = whole + fraction.value;
  if (amount === 0) return [];
  const noun = amount > 1 ? 'cups' : 'cup';
  return [{ unit: 'cup', amount, label: `${withFraction(whole, fraction.glyph)} ${noun}` }];
}

function spoonCandidate(
  ml: number,
  whole: number,
  fraction: (typeof CUP_FRACTIONS)[number],
  system: MeasureSystem,
): Candidate {
  const { tspMl, cupMl } = spoonVolumes(system);
  const eighthMl = tspMl / 8;
  const cupsMl = (whole + fraction.value) * cupMl;
  const eighths = Math.max(0, Math.round((ml - cupsMl) / eighthMl));
  const tbsp = Math.floor(eighths / 24);
  const tspWhole = Math.floor((eighths % 24) / 8);
  const tspEighths = eighths % 8;
  const parts = cupPart(whole, fraction);
  if (tbsp > 0) parts.push({ unit: 'tbsp', amount: tbsp, label: `${tbsp} tbsp` });
  const tspGlyph = TSP_EIGHTHS[tspEighths] ?? TSP_EIGHTHS[0]!;
  if (tspWhole > 0 || tspEighths > 0) {
    parts.push({
      unit: 'tsp',
      amount: tspWhole + tspEighths / 8,
      label: `${withFraction(tspWhole, tspGlyph.glyph)} tsp`,
    });
  }
  return {
    parts,
    measuredMl: cupsMl + eighths * eighthMl,
    scoops: whole + fraction.scoops + tbsp + tspWhole + tspGlyph.scoops,
    cupMl: cupsMl,
  };
}

/**
 * The nearest practical combination of cups, tablespoons and teaspoons (down to ⅛ tsp) for an
 * amount in mL, with the rounding error it introduces. Among equally near combinations it picks
 * the one with the fewest scoops (e.g. "¼ cup" rather than "4 tbsp").
 */
export function toHouseholdMeasure(
  mL: number,
  options: { system: MeasureSystem } = { system: 'us' },
): HouseholdMeasure {
  requireNonNegative('mL', mL);
  const { system } = options;
  const { tspMl, cupMl } = spoonVolumes(system);
  const halfEighthMl = tspMl / 16;
  const cupsOnly = mL >= CUPS_ONLY_FROM * cupMl;

  const candidates: Candidate[] = [];
  const wholeCups = Math.floor(mL / cupMl);
  // Past 4 cups only the cup counts nearest the amount matter.
  for (let whole = cupsOnly ? wholeCups - 1 : 0; whole <= wholeCups + 1; whole++) {
    for (const fraction of CUP_FRACTIONS) {
      const cupsMl = (whole + fraction.value) * cupMl;
      if (cupsOnly) {
        const parts = cupPart(whole, fraction);
        candidates.push({
          parts,
          measuredMl: cupsMl,
          scoops: whole + fraction.scoops,
          cupMl: cupsMl,
        });
      } else if (cupsMl <= mL + halfEighthMl) {
        candidates.push(spoonCandidate(mL, whole, fraction, system));
      }
    }
  }

  // Nearest first, but within half of ⅛ tsp of the nearest, fewer scoops win (then more in cups):
  // "½ cup + 2 tbsp + 1 tsp" beats a marginally nearer "⅓ cup + 5 tbsp + ⅞ tsp".
  const bestError = Math.min(...candidates.map((c) => Math.abs(c.measuredMl - mL)));
  const best = candidates
    .filter((c) => Math.abs(c.measuredMl - mL) <= bestError + halfEighthMl)
    .sort((x, y) => x.scoops - y.scoops || y.cupMl - x.cupMl)[0]!;

  const tooSmallToMeasure = mL > 0 && best.measuredMl === 0;
  const roundingErrorMl = best.measuredMl - mL;
  let label = best.parts.map((p) => p.label).join(' + ');
  if (tooSmallToMeasure) label = 'less than ⅛ tsp';
  else if (label === '') label = 'none';
  return {
    system,
    parts: best.parts,
    label,
    measuredMl: best.measuredMl,
    roundingErrorMl,
    roundingErrorPct: mL === 0 ? 0 : (roundingErrorMl / mL) * 100,
    tooSmallToMeasure,
  };
}
