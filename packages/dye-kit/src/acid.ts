import { DyeKitError, requirePercent, requirePositive } from './errors.ts';
import { toHouseholdMeasure, type HouseholdMeasure } from './household.ts';
import type { DyeKitWarning } from './warning.ts';
import { US_TBSP_ML } from './units.ts';

export type AcidKind = 'vinegar' | 'citric';

// Common practice for acid dyes and food color on protein fiber (from memory, see
// packages/dye-kit/test-data/README.md): with 5 % table vinegar, at least ¼ cup (60 mL) per pound (450 g)
// of dry fiber, and by bath volume 15–60 mL per liter; citric acid about 1 tbsp of crystals
// per pound of fiber.
const REFERENCE_VINEGAR_PCT = 5;
const VINEGAR_MIN_ML_PER_G_FIBER = 60 / 450;
const VINEGAR_MIN_ML_PER_L_BATH = 15;
const VINEGAR_MAX_ML_PER_L_BATH = 60;
/** The middle of the working range: plenty of acid without a sharp smell. */
const VINEGAR_RECOMMENDED_ML_PER_L_BATH =
  (VINEGAR_MIN_ML_PER_L_BATH + VINEGAR_MAX_ML_PER_L_BATH) / 2;
const LB_G = 453.59237;
const CITRIC_RECOMMENDED_ML_PER_G_FIBER = US_TBSP_ML / LB_G;
/** A product choice around the common 1 tbsp per pound: ¾ to 1 ½ tbsp. */
const CITRIC_RANGE_FACTORS = { min: 0.75, max: 1.5 };
/** Above this, vinegar is a cleaning-strength acid rather than table vinegar. */
const STRONG_VINEGAR_PCT = 10;

export interface AcidInput {
  /** Dry weight of the fiber in the bath, g. */
  weightOfGoodsG: number;
  bathVolumeMl: number;
  acid: AcidKind;
  /** Acetic acid in the vinegar, % (table vinegar is commonly 5 %); vinegar only. */
  acidStrengthPct?: number;
}

export interface AcidAmount {
  acid: AcidKind;
  /** Acetic acid strength the amounts are for (vinegar only). */
  acidStrengthPct: number | null;
  /** Recommended volume: liquid vinegar, or citric acid crystals measured by spoon, mL. */
  recommendedMl: number;
  rangeMl: { min: number; max: number };
  /** The rule used, in words, to show beside the amount. */
  rule: string;
  household: { us: HouseholdMeasure; metric: HouseholdMeasure };
  warnings: DyeKitWarning[];
}

/** Acid for a dye bath by the common-practice rules above, with a range and household measures. */
export function acidFor(input: AcidInput): AcidAmount {
  requirePositive('weightOfGoodsG', input.weightOfGoodsG);
  requirePositive('bathVolumeMl', input.bathVolumeMl);
  if (input.acid === 'citric') {
    if (input.acidStrengthPct !== undefined) {
      throw new DyeKitError(
        'INVALID_OPTION',
        'acidStrengthPct applies to vinegar only.',
        'acidStrengthPct',
      );
    }
    const recommendedMl = input.weightOfGoodsG * CITRIC_RECOMMENDED_ML_PER_G_FIBER;
    return result(
      'citric',
      null,
      recommendedMl,
      {
        min: recommendedMl * CITRIC_RANGE_FACTORS.min,
        max: recommendedMl * CITRIC_RANGE_FACTORS.max,
      },
      'Citric acid crystals: about 1 tbsp per pound (450 g) of dry fiber, ¾ to 1 ½ tbsp (common practice). Dissolve in hot water before adding.',
      [],
    );
  }
  if (input.acid !== 'vinegar') {
    throw new DyeKitError('INVALID_OPTION', `Unknown acid "${String(input.acid)}".`, 'acid');
  }
  const strengthPct = requirePercent(
    'acidStrengthPct',
    input.acidStrengthPct ?? REFERENCE_VINEGAR_PCT,
    false,
  );
  // Weaker or stronger vinegar than 5 % needs proportionally more or less liquid.
  const strengthFactor = REFERENCE_VINEGAR_PCT / strengthPct;
  const bathL = input.bathVolumeMl / 1000;
  const fiberMinMl = input.weightOfGoodsG * VINEGAR_MIN_ML_PER_G_FIBER;
  const min = Math.max(fiberMinMl, bathL * VINEGAR_MIN_ML_PER_L_BATH) * strengthFactor;
  const max = Math.max(bathL * VINEGAR_MAX_ML_PER_L_BATH * strengthFactor, min);
  const recommendedMl = Math.min(
    max,
    Math.max(min, bathL * VINEGAR_RECOMMENDED_ML_PER_L_BATH * strengthFactor),
  );
  const warnings: DyeKitWarning[] = [];
  if (strengthPct > STRONG_VINEGAR_PCT) {
    warnings.push({
      code: 'STRONG_VINEGAR',
      severity: 'warning',
      message: `${strengthPct} % vinegar is much stronger than table vinegar: wear gloves and eye protection, and add it to the water, never the other way around.`,
    });
  }
  return result(
    'vinegar',
    strengthPct,
    recommendedMl,
    { min, max },
    `Vinegar at ${strengthPct} % acetic acid: at least ¼ cup (60 mL) per pound (450 g) of dry fiber, and 15–60 mL per liter of bath, for 5 % vinegar (common practice); the amount shown is the middle of that range, scaled for the strength.`,
    warnings,
  );
}

function result(
  acid: AcidKind,
  acidStrengthPct: number | null,
  recommendedMl: number,
  rangeMl: { min: number; max: number },
  rule: string,
  warnings: DyeKitWarning[],
): AcidAmount {
  return {
    acid,
    acidStrengthPct,
    recommendedMl,
    rangeMl,
    rule,
    household: {
      us: toHouseholdMeasure(recommendedMl, { system: 'us' }),
      metric: toHouseholdMeasure(recommendedMl, { system: 'metric' }),
    },
    warnings,
  };
}
