import { requireNonNegative, requirePercent, requirePositive, DyeKitError } from './errors.ts';
import { DEFAULT_DROPS_PER_ML } from './units.ts';

// Common practice in hand-dyeing: depth of shade (DOS) is dye mass as a percentage of the dry
// weight of the fiber ("weight of goods"); stock strength is % w/v, i.e. grams of dye per 100 mL.

/** Grams of dye for a depth of shade: WOG × DOS ÷ 100 (common practice). */
export function dyeMassG(input: { weightOfGoodsG: number; depthOfShadePct: number }): number {
  requirePositive('weightOfGoodsG', input.weightOfGoodsG);
  requirePercent('depthOfShadePct', input.depthOfShadePct, true);
  return (input.weightOfGoodsG * input.depthOfShadePct) / 100;
}

/** mL of stock solution for a depth of shade: WOG × DOS ÷ stock strength (common practice). */
export function stockVolumeMl(input: {
  weightOfGoodsG: number;
  depthOfShadePct: number;
  stockStrengthPct: number;
}): number {
  requirePercent('stockStrengthPct', input.stockStrengthPct, false);
  return (dyeMassG(input) * 100) / input.stockStrengthPct;
}

/** Depth of shade in percent that a dye mass gives on a skein: dye ÷ WOG × 100. */
export function depthOfShade(input: { dyeMassG: number; weightOfGoodsG: number }): number {
  requireNonNegative('dyeMassG', input.dyeMassG);
  requirePositive('weightOfGoodsG', input.weightOfGoodsG);
  return (input.dyeMassG / input.weightOfGoodsG) * 100;
}

/** Grams of dye held by a volume of stock solution at a strength in % w/v. */
export function dyeMassInStockG(input: { stockStrengthPct: number; volumeMl: number }): number {
  requirePercent('stockStrengthPct', input.stockStrengthPct, false);
  requireNonNegative('volumeMl', input.volumeMl);
  return (input.stockStrengthPct * input.volumeMl) / 100;
}

/**
 * Bath volume for a liquor ratio (bath : fiber by weight, e.g. 30 for 30:1); water is taken as
 * 1 g/mL.
 */
export function bathVolumeMl(input: { weightOfGoodsG: number; liquorRatio: number }): number {
  requirePositive('weightOfGoodsG', input.weightOfGoodsG);
  requirePositive('liquorRatio', input.liquorRatio);
  return input.weightOfGoodsG * input.liquorRatio;
}

/** How a food-color line is measured: liquid by volume, liquid by drops, or gel by weight. */
export type FoodColorUnit = 'mL' | 'drop' | 'gGel';

export interface FoodColorAmount {
  amount: number;
  unit: FoodColorUnit;
  /** Volume of liquid color in mL; null for gel, which is weighed. */
  volumeMl: number | null;
  /** True for drops: a drop's size depends on the bottle. */
  approximate: boolean;
}

/**
 * Food color for a skein from an amount per 100 g of dry fiber. Strength of household food
 * color is unknown, so it scales by weight like a depth of shade.
 */
export function foodColorAmount(input: {
  amountPer100g: number;
  unit: FoodColorUnit;
  weightOfGoodsG: number;
  /** Drops per mL for this bottle (calibrate by counting drops into a 1 mL syringe). */
  dropsPerMl?: number;
}): FoodColorAmount {
  requireNonNegative('amountPer100g', input.amountPer100g);
  requirePositive('weightOfGoodsG', input.weightOfGoodsG);
  const dropsPerMl = requirePositive('dropsPerMl', input.dropsPerMl ?? DEFAULT_DROPS_PER_ML);
  const amount = (input.amountPer100g * input.weightOfGoodsG) / 100;
  switch (input.unit) {
    case 'mL':
      return { amount, unit: 'mL', volumeMl: amount, approximate: false };
    case 'drop':
      return { amount, unit: 'drop', volumeMl: amount / dropsPerMl, approximate: true };
    case 'gGel':
      return { amount, unit: 'gGel', volumeMl: null, approximate: false };
    default:
      throw new DyeKitError(
        'UNKNOWN_UNIT',
        `Unknown food color unit "${String(input.unit)}".`,
        'unit',
      );
  }
}
