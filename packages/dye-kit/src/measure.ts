import type { FoodColorUnit } from './dye.ts';
import { requireNonNegative } from './errors.ts';
import {
  smallestMeasureMl,
  toHouseholdMeasure,
  type HouseholdMeasure,
  type MeasureSystem,
} from './household.ts';

/** Rounding that changes an amount by more than this is worth a warning (a product choice). */
export const ROUNDING_WARNING_PCT = 10;
/** Gel color is weighed on a pocket scale reading 0.01 g; under 0.05 g it can't be weighed well. */
const GEL_RESOLUTION_G = 0.01;
const SMALLEST_GEL_G = 0.05;

export interface Measurement {
  /** What a home dyer actually measures: spoon total in mL, whole drops, or gel to 0.01 g. */
  roundedAmount: number;
  /** Spoon combination for liquids in mL; null for drops and gel. */
  household: HouseholdMeasure | null;
  tooSmall: boolean;
  roundingErrorPct: number;
}

/** How an amount would be measured at home and how much the rounding changes it. */
export function measureAtHome(
  amount: number,
  unit: FoodColorUnit,
  system: MeasureSystem,
): Measurement {
  requireNonNegative('amount', amount);
  if (unit === 'mL') {
    const household = toHouseholdMeasure(amount, { system });
    return {
      roundedAmount: household.measuredMl,
      household,
      tooSmall: amount > 0 && amount < smallestMeasureMl(system),
      roundingErrorPct: household.roundingErrorPct,
    };
  }
  const step = unit === 'drop' ? 1 : GEL_RESOLUTION_G;
  const roundedAmount = Math.round(amount / step) * step;
  return {
    roundedAmount,
    household: null,
    tooSmall: amount > 0 && amount < (unit === 'drop' ? 1 : SMALLEST_GEL_G),
    roundingErrorPct: amount === 0 ? 0 : ((roundedAmount - amount) / amount) * 100,
  };
}
