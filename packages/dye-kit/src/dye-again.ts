import { depthOfShade, dyeMassInStockG } from './dye.ts';
import { DyeKitError, requireNonNegative, requirePositive } from './errors.ts';
import { validateRecipe, type Recipe, type RecipeLine } from './recipe.ts';

// Dyeing an archived colorway again: the recipe is rebuilt from what actually went into the pot
// (the dye log), measured against the dry fiber dyed that day, so the repeat matches the skeins
// that were made rather than the plan.

export interface LoggedRecipe {
  /** The recipe as planned (for the host's one skein). */
  planned: Recipe;
  /** Logged amount per planned line, in the line's unit, for all the fiber dyed; null: none. */
  loggedAmounts: ReadonlyArray<number | null>;
  /** Dry weight of all the fiber in the pot that day, g. */
  fiberWeightDyedG: number;
  /** The bath as measured that day, mL; without it the planned liquor ratio stands. */
  bathVolumeMl?: number | null;
}

export interface RebuiltLine {
  /** 'actual' when the line comes from the log, 'planned' when nothing was logged for it. */
  from: 'actual' | 'planned';
  /** Depth of shade reached (stock lines), % on weight of dry fiber. */
  depthOfShadePct: number | null;
  /** Food color per 100 g of dry fiber (food-color lines), in the line's unit. */
  amountPer100g: number | null;
}

export interface RebuiltRecipe {
  /** The recipe for one skein of `weightOfGoodsG`, ready for `scaleRecipe`. */
  recipe: Recipe;
  lines: RebuiltLine[];
}

/**
 * The recipe a logged bath implies, written for a skein of `weightOfGoodsG`. Stock lines: dye
 * mass = strength × logged mL ÷ 100, then depth of shade = dye mass ÷ fiber dyed × 100 (common
 * practice, see packages/dye-kit/test-data/README.md: dye mass = WOG × DOS ÷ 100). Food color has no known
 * strength, so it is restated per 100 g of the fiber dyed. The liquor ratio is the bath volume
 * over the fiber dyed when the bath was measured; a planned acid amount scales with the skein.
 */
export function recipeFromLog(input: LoggedRecipe, weightOfGoodsG: number): RebuiltRecipe {
  const planned = validateRecipe(input.planned);
  const fiberG = requirePositive('fiberWeightDyedG', input.fiberWeightDyedG);
  requirePositive('weightOfGoodsG', weightOfGoodsG);
  if (input.loggedAmounts.length !== planned.lines.length) {
    throw new DyeKitError(
      'INVALID_RECIPE',
      'Give one logged amount (or null) per recipe line.',
      'loggedAmounts',
    );
  }
  const liquorRatio =
    input.bathVolumeMl === undefined || input.bathVolumeMl === null
      ? planned.liquorRatio
      : requirePositive('bathVolumeMl', input.bathVolumeMl) / fiberG;
  const rebuilt = planned.lines.map((line, i): { line: RecipeLine; info: RebuiltLine } => {
    const logged = input.loggedAmounts[i];
    if (logged === null || logged === undefined) {
      return {
        line,
        info: {
          from: 'planned',
          depthOfShadePct: line.kind === 'stock' ? line.depthOfShadePct : null,
          amountPer100g: line.kind === 'foodColor' ? line.amountPer100g : null,
        },
      };
    }
    requireNonNegative(`loggedAmounts[${i}]`, logged);
    if (line.kind === 'stock') {
      const dyeMassG = dyeMassInStockG({
        stockStrengthPct: line.stockStrengthPct,
        volumeMl: logged,
      });
      const depthOfShadePct = depthOfShade({ dyeMassG, weightOfGoodsG: fiberG });
      return {
        line: { ...line, depthOfShadePct },
        info: { from: 'actual', depthOfShadePct, amountPer100g: null },
      };
    }
    const amountPer100g = (logged / fiberG) * 100;
    return {
      line: { ...line, amountPer100g },
      info: { from: 'actual', depthOfShadePct: null, amountPer100g },
    };
  });
  const { acid } = planned;
  const scaledAcid =
    acid.amountMl === undefined
      ? acid
      : { ...acid, amountMl: (acid.amountMl * weightOfGoodsG) / planned.weightOfGoodsG };
  const recipe = validateRecipe({
    weightOfGoodsG,
    liquorRatio,
    acid: scaledAcid,
    lines: rebuilt.map((r) => r.line),
  });
  return { recipe, lines: rebuilt.map((r) => r.info) };
}

export interface StockShortfall {
  status: 'enough' | 'short' | 'missing';
  /** Stock to mix before starting, mL (0 when there is enough). */
  mixMl: number;
  /** Dye powder in that stock, g: strength (% w/v) × mL ÷ 100. */
  mixDyePowderG: number;
}

/** How much of a stock solution to mix first, given what is needed and what the jars hold. */
export function stockShortfall(input: {
  neededMl: number;
  onShelfMl: number;
  stockStrengthPct: number;
}): StockShortfall {
  const needed = requireNonNegative('neededMl', input.neededMl);
  const onShelf = requireNonNegative('onShelfMl', input.onShelfMl);
  const mixMl = Math.max(0, needed - onShelf);
  const status = onShelf === 0 && needed > 0 ? 'missing' : mixMl > 0 ? 'short' : 'enough';
  return {
    status,
    mixMl,
    mixDyePowderG: dyeMassInStockG({ stockStrengthPct: input.stockStrengthPct, volumeMl: mixMl }),
  };
}
