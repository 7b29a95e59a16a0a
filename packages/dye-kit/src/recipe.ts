import type { ColorantId } from './colorants.ts';
import type { FoodColorUnit } from './dye.ts';
import { DyeKitError, requireNonNegative, requirePercent, requirePositive } from './errors.ts';

/** A line of acid dye measured from a stock solution. */
export interface StockLine {
  kind: 'stock';
  /** The dye as the host names it, e.g. "turquoise". */
  dyeName: string;
  /** Strength of the stock solution, % w/v (grams of dye powder per 100 mL). */
  stockStrengthPct: number;
  /** Depth of shade: dye mass as % of the dry weight of goods. */
  depthOfShadePct: number;
}

/** A line of household food color, whose strength is unknown, given per 100 g of dry fiber. */
export interface FoodColorLine {
  kind: 'foodColor';
  /** The color as the bottle or the host names it, e.g. "sky blue gel". */
  colorName: string;
  /** Amount for 100 g of dry fiber, in `unit`. */
  amountPer100g: number;
  /** Liquid by mL or by drops, or gel by grams. */
  unit: FoodColorUnit;
  /** Drops per mL for this bottle when the unit is drops; defaults to 20 (approximate). */
  dropsPerMl?: number;
  /** Certified colorants on the label, when known (they tell whether the color may break). */
  colorants?: ColorantId[];
}

export type RecipeLine = StockLine | FoodColorLine;

/**
 * Acid for the bath. `amountMl` is the host's own amount for their skein (vinegar liquid, or
 * citric acid crystals by spoon); without it the common-practice rule of `acidFor` decides.
 */
export type RecipeAcid =
  | { acid: 'vinegar'; acidStrengthPct: number; amountMl?: number }
  | { acid: 'citric'; amountMl?: number };

/**
 * A dye recipe as the host wrote it for their own skein. Every line is relative (depth of shade,
 * or food color per 100 g), so the recipe scales to any skein by weight.
 */
export interface Recipe {
  /** Dry weight of the host's skein, g. */
  weightOfGoodsG: number;
  /** Bath volume : dry fiber weight, e.g. 30 for 30:1 (water at 1 g/mL). */
  liquorRatio: number;
  acid: RecipeAcid;
  /** Dye lines in the order they go into the pot. */
  lines: RecipeLine[];
}

/** Throws a DyeKitError unless the recipe is complete and every number is usable. */
export function validateRecipe(recipe: Recipe): Recipe {
  if (recipe === null || typeof recipe !== 'object' || !Array.isArray(recipe.lines as unknown)) {
    throw new DyeKitError(
      'INVALID_RECIPE',
      'A recipe needs a weight of goods, a liquor ratio, acid and lines.',
      'recipe',
    );
  }
  requirePositive('weightOfGoodsG', recipe.weightOfGoodsG);
  requirePositive('liquorRatio', recipe.liquorRatio);
  const acid = recipe.acid;
  if (acid?.acid === 'vinegar') requirePercent('acid.acidStrengthPct', acid.acidStrengthPct, false);
  else if (acid?.acid !== 'citric') {
    throw new DyeKitError('INVALID_RECIPE', 'Acid must be vinegar or citric.', 'acid');
  }
  if (acid.amountMl !== undefined) requireNonNegative('acid.amountMl', acid.amountMl);
  recipe.lines.forEach((line, i) => {
    if (line?.kind === 'stock') {
      requirePercent(`lines[${i}].stockStrengthPct`, line.stockStrengthPct, false);
      requirePercent(`lines[${i}].depthOfShadePct`, line.depthOfShadePct, true);
    } else if (line?.kind === 'foodColor') {
      requireNonNegative(`lines[${i}].amountPer100g`, line.amountPer100g);
      if (!['mL', 'drop', 'gGel'].includes(line.unit)) {
        throw new DyeKitError(
          'UNKNOWN_UNIT',
          `Unknown food color unit "${String(line.unit)}".`,
          `lines[${i}].unit`,
        );
      }
      if (line.dropsPerMl !== undefined) requirePositive(`lines[${i}].dropsPerMl`, line.dropsPerMl);
    } else {
      throw new DyeKitError(
        'INVALID_RECIPE',
        'A line is either "stock" or "foodColor".',
        `lines[${i}].kind`,
      );
    }
  });
  return recipe;
}

/** The name a line shows: the dye or the food color. */
export function lineName(line: RecipeLine): string {
  return line.kind === 'stock' ? line.dyeName : line.colorName;
}
