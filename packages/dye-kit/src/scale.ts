import { acidFor } from './acid.ts';
import {
  bathVolumeMl,
  dyeMassG,
  foodColorAmount,
  stockVolumeMl,
  type FoodColorUnit,
} from './dye.ts';
import { DyeKitError, requirePositive } from './errors.ts';
import {
  smallestMeasureMl,
  spoonVolumes,
  toHouseholdMeasure,
  type HouseholdMeasure,
  type MeasureSystem,
} from './household.ts';
import { measureAtHome, ROUNDING_WARNING_PCT, type Measurement } from './measure.ts';
import { validateRecipe, type Recipe, type RecipeAcid, type RecipeLine } from './recipe.ts';
import type { DyeKitWarning } from './warning.ts';

/** Scale to a total dry weight, or to a number of skeins like the host's. */
export type ScaleTarget = ({ weightOfGoodsG: number } | { skeins: number }) & ScaleOptions;

export interface ScaleOptions {
  /** Full capacity of the viewer's pot, mL; baths that don't fit are split into batches. */
  potCapacityMl?: number;
  /** Household measures to round to; defaults to US customary. */
  system?: MeasureSystem;
  /** Drops per mL for bottles without their own calibration; defaults to 20 (approximate). */
  dropsPerMl?: number;
}

export interface LineAmount {
  lineIndex: number;
  kind: RecipeLine['kind'];
  name: string;
  /** Exact amount in `unit`. */
  amount: number;
  unit: FoodColorUnit;
  /** Liquid volume in mL (stock or liquid color); null for gel. */
  volumeMl: number | null;
  /** Grams of dye powder in the stock measured (stock lines only). */
  dyeMassG: number | null;
  approximate: boolean;
  measurement: Measurement;
}

export interface AcidLine {
  acid: RecipeAcid['acid'];
  acidStrengthPct: number | null;
  amountMl: number;
  /** 'recipe' when scaled from the host's amount, 'rule' when from the common-practice rule. */
  source: 'recipe' | 'rule';
  household: HouseholdMeasure;
}

export interface BathAmounts {
  weightOfGoodsG: number;
  bathVolumeMl: number;
  water: HouseholdMeasure;
  lines: LineAmount[];
  acid: AcidLine;
}

export interface Batch extends BathAmounts {
  index: number;
  /** Skeins in this batch when scaling by skeins. */
  skeins: number | null;
}

export interface ScaledRecipe extends BathAmounts {
  /** The recipe restated for the new total weight (the host's acid amount scaled with it). */
  recipe: Recipe;
  scaleFactor: number;
  skeins: number | null;
  /** One batch when everything fits the pot; otherwise several, each at the same liquor ratio. */
  batches: Batch[];
  warnings: DyeKitWarning[];
}

/** Fill a pot to at most this fraction: room for the yarn and a simmer (common practice). */
const POT_FILL_FRACTION = 0.8;

function acidLine(
  recipe: Recipe,
  weightOfGoodsG: number,
  bathMl: number,
  system: MeasureSystem,
): AcidLine {
  const { acid } = recipe;
  const acidStrengthPct = acid.acid === 'vinegar' ? acid.acidStrengthPct : null;
  const amountMl =
    acid.amountMl !== undefined
      ? (acid.amountMl * weightOfGoodsG) / recipe.weightOfGoodsG
      : acidFor({
          weightOfGoodsG,
          bathVolumeMl: bathMl,
          ...(acid.acid === 'vinegar'
            ? { acid: 'vinegar', acidStrengthPct: acid.acidStrengthPct }
            : { acid: 'citric' }),
        }).recommendedMl;
  return {
    acid: acid.acid,
    acidStrengthPct,
    amountMl,
    source: acid.amountMl !== undefined ? 'recipe' : 'rule',
    household: toHouseholdMeasure(amountMl, { system }),
  };
}

function lineAmount(
  line: RecipeLine,
  lineIndex: number,
  weightOfGoodsG: number,
  options: ScaleOptions,
): LineAmount {
  const system = options.system ?? 'us';
  if (line.kind === 'stock') {
    const volumeMl = stockVolumeMl({ weightOfGoodsG, ...line });
    return {
      lineIndex,
      kind: 'stock',
      name: line.dyeName,
      amount: volumeMl,
      unit: 'mL',
      volumeMl,
      dyeMassG: dyeMassG({ weightOfGoodsG, depthOfShadePct: line.depthOfShadePct }),
      approximate: false,
      measurement: measureAtHome(volumeMl, 'mL', system),
    };
  }
  const dropsPerMl = line.dropsPerMl ?? options.dropsPerMl;
  const color = foodColorAmount({
    amountPer100g: line.amountPer100g,
    unit: line.unit,
    weightOfGoodsG,
    ...(dropsPerMl !== undefined ? { dropsPerMl } : {}),
  });
  return {
    lineIndex,
    kind: 'foodColor',
    name: line.colorName,
    amount: color.amount,
    unit: color.unit,
    volumeMl: color.volumeMl,
    dyeMassG: null,
    approximate: color.approximate,
    measurement: measureAtHome(color.amount, color.unit, system),
  };
}

/** Every amount for one bath of `weightOfGoodsG` dry fiber at the recipe's liquor ratio. */
export function bathAmounts(
  recipe: Recipe,
  weightOfGoodsG: number,
  options: ScaleOptions = {},
): BathAmounts {
  validateRecipe(recipe);
  const system = options.system ?? 'us';
  const bathMl = bathVolumeMl({ weightOfGoodsG, liquorRatio: recipe.liquorRatio });
  return {
    weightOfGoodsG,
    bathVolumeMl: bathMl,
    water: toHouseholdMeasure(bathMl, { system }),
    lines: recipe.lines.map((line, i) => lineAmount(line, i, weightOfGoodsG, options)),
    acid: acidLine(recipe, weightOfGoodsG, bathMl, system),
  };
}

/** Past 1:1000 a home dilution is no longer practical. */
const MAX_DILUTION = 1000;

/** How a too-small amount becomes measurable: dilute 1:10 (or 1:100…) and use ten times more. */
function dilutionAdvice(line: LineAmount, recipe: Recipe, system: MeasureSystem): string {
  // Dilute until the amount to measure is at least ¼ tsp, where spoon rounding stays modest.
  const enoughMl = smallestMeasureMl(system) * 2;
  const baseMl = line.volumeMl ?? line.amount * 10; // gel: 1 g dissolved to 10 mL of mix
  if (baseMl * MAX_DILUTION < enoughMl) {
    return 'It is so little that it will barely show: leave it out, or dye a larger batch.';
  }
  let factor = line.volumeMl === null ? 1 : 10;
  while (baseMl * factor < enoughMl) factor *= 10;
  const useLabel = toHouseholdMeasure(baseMl * factor, { system }).label;
  const source = recipe.lines[line.lineIndex];
  if (source?.kind === 'stock') {
    const weaker = Number((source.stockStrengthPct / factor).toPrecision(3));
    return `Mix a weaker stock: 1 part of your ${source.stockStrengthPct} % stock to ${factor - 1} parts water (1:${factor}) makes a ${weaker} % stock; use ${useLabel} of it.`;
  }
  if (line.unit === 'gGel') {
    return `Dissolve 1 g of the gel in hot water to make ${10 * factor} mL, and use ${useLabel} of that mix.`;
  }
  if (line.unit === 'drop') {
    // Count one drop into a cup or spoon of water, then measure the mix by spoon.
    const { tspMl, tbspMl, cupMl } = spoonVolumes(system);
    const waters = [
      { label: '1 tsp', ml: tspMl },
      { label: '1 tbsp', ml: tbspMl },
      { label: '¼ cup', ml: cupMl / 4 },
      { label: '1 cup', ml: cupMl },
    ];
    const water = waters.find((w) => line.amount * w.ml >= enoughMl) ?? waters[waters.length - 1]!;
    const mixLabel = toHouseholdMeasure(line.amount * water.ml, { system }).label;
    return `Stir 1 drop of the color into ${water.label} of water and use ${mixLabel} of that mix.`;
  }
  return `Dilute the color 1:${factor} with water (1 part color, ${factor - 1} parts water) and use ${useLabel} of the mix.`;
}

/** Warnings for amounts that can't be measured at home, or that rounding would change. */
function measurementWarnings(
  amounts: BathAmounts,
  recipe: Recipe,
  system: MeasureSystem,
): DyeKitWarning[] {
  const warnings: DyeKitWarning[] = [];
  for (const line of amounts.lines) {
    const { measurement } = line;
    const unitWord = line.unit === 'drop' ? 'drops' : line.unit === 'gGel' ? 'g of gel' : 'mL';
    const precisely = line.unit === 'mL' ? ' A syringe marked in mL measures it exactly.' : '';
    const exact = `${formatAmount(line.amount)} ${unitWord}`;
    if (measurement.tooSmall) {
      warnings.push({
        code: 'AMOUNT_TOO_SMALL',
        severity: 'warning',
        lineIndex: line.lineIndex,
        message: `${line.name}: ${exact} is too little to measure at home. ${dilutionAdvice(line, recipe, system)}`,
      });
    } else if (Math.abs(measurement.roundingErrorPct) > ROUNDING_WARNING_PCT) {
      const rounded =
        measurement.household?.label ?? `${formatAmount(measurement.roundedAmount)} ${unitWord}`;
      warnings.push({
        code: 'ROUNDING_CHANGES_RESULT',
        severity: 'info',
        lineIndex: line.lineIndex,
        message: `${line.name}: measuring ${exact} as ${rounded} changes it by ${Math.round(measurement.roundingErrorPct)} %; the color will be ${measurement.roundingErrorPct > 0 ? 'deeper' : 'lighter'}.${precisely}`,
      });
    }
  }
  return warnings;
}

/** Up to 3 significant digits for messages. */
function formatAmount(value: number): string {
  return String(Number(value.toPrecision(3)));
}

function splitSkeins(skeins: number, batchCount: number): number[] {
  const base = Math.floor(skeins / batchCount);
  const extra = skeins % batchCount;
  return Array.from({ length: batchCount }, (_, i) => base + (i < extra ? 1 : 0));
}

/**
 * Scales a recipe from the host's skein to a viewer's weight or to N skeins: every line, the acid
 * and the water. Splits into batches when the pot would overflow, keeping the liquor ratio, and
 * warns where an amount is too small to measure or rounding changes it noticeably.
 */
export function scaleRecipe(recipe: Recipe, target: ScaleTarget): ScaledRecipe {
  validateRecipe(recipe);
  const system = target.system ?? 'us';
  if (system !== 'us' && system !== 'metric') {
    throw new DyeKitError('INVALID_OPTION', 'system must be "us" or "metric".', 'system');
  }
  if (target.dropsPerMl !== undefined) requirePositive('dropsPerMl', target.dropsPerMl);
  let skeins: number | null = null;
  let totalWeightG: number;
  if ('skeins' in target) {
    if (!Number.isInteger(target.skeins) || target.skeins < 1) {
      throw new DyeKitError(
        'INVALID_AMOUNT',
        'skeins must be a whole number of at least 1.',
        'skeins',
      );
    }
    skeins = target.skeins;
    totalWeightG = recipe.weightOfGoodsG * skeins;
  } else {
    totalWeightG = requirePositive('weightOfGoodsG', target.weightOfGoodsG);
  }
  const options: ScaleOptions = {
    system,
    ...(target.dropsPerMl !== undefined ? { dropsPerMl: target.dropsPerMl } : {}),
  };
  const scaleFactor = totalWeightG / recipe.weightOfGoodsG;
  const total = bathAmounts(recipe, totalWeightG, options);
  const warnings: DyeKitWarning[] = [];

  let batchWeights = [totalWeightG];
  let batchSkeins: Array<number | null> = [skeins];
  if (target.potCapacityMl !== undefined) {
    const usableMl = requirePositive('potCapacityMl', target.potCapacityMl) * POT_FILL_FRACTION;
    if (total.bathVolumeMl > usableMl) {
      if (skeins !== null) {
        const skeinBathMl = recipe.weightOfGoodsG * recipe.liquorRatio;
        const perBatch = Math.max(1, Math.floor(usableMl / skeinBathMl));
        if (skeinBathMl > usableMl) {
          warnings.push({
            code: 'POT_TOO_SMALL',
            severity: 'critical',
            message: `One skein needs ${Math.round(skeinBathMl)} mL of bath at ${recipe.liquorRatio}:1, more than your pot holds with room to simmer (${Math.round(usableMl)} mL). Use a bigger pot.`,
          });
        }
        batchSkeins = splitSkeins(skeins, Math.ceil(skeins / perBatch));
        batchWeights = batchSkeins.map((n) => (n ?? 0) * recipe.weightOfGoodsG);
      } else {
        const count = Math.ceil(total.bathVolumeMl / usableMl);
        batchWeights = Array.from({ length: count }, () => totalWeightG / count);
        batchSkeins = batchWeights.map(() => null);
      }
      if (batchWeights.length > 1) {
        warnings.push({
          code: 'SPLIT_INTO_BATCHES',
          severity: 'info',
          message: `That is ${Math.round(total.bathVolumeMl)} mL of bath, more than your pot holds with room to simmer. Dye it in ${batchWeights.length} batches, each with its own water, acid and dye, so every skein sees the same liquor ratio.`,
        });
      }
    }
  }
  // Batches come in at most two sizes: work each size out once.
  const bySize = new Map<number, BathAmounts>([[totalWeightG, total]]);
  const amountsFor = (weightG: number) => {
    const known = bySize.get(weightG) ?? bathAmounts(recipe, weightG, options);
    bySize.set(weightG, known);
    return known;
  };
  const batches: Batch[] = batchWeights.map((weightG, index) => ({
    index,
    skeins: batchSkeins[index] ?? null,
    ...amountsFor(weightG),
  }));

  // What is measured is each batch; report each line's problem once.
  const seen = new Set<string>();
  for (const size of new Set(batchWeights)) {
    for (const warning of measurementWarnings(amountsFor(size), recipe, system)) {
      const key = `${warning.code}:${warning.lineIndex ?? ''}`;
      if (!seen.has(key)) warnings.push(warning);
      seen.add(key);
    }
  }

  const acid = recipe.acid;
  const scaledAcid: RecipeAcid =
    acid.amountMl === undefined ? acid : { ...acid, amountMl: acid.amountMl * scaleFactor };
  return {
    ...total,
    recipe: { ...recipe, weightOfGoodsG: totalWeightG, acid: scaledAcid, lines: [...recipe.lines] },
    scaleFactor,
    skeins,
    batches,
    warnings,
  };
}
