import type { LiveProgramPot, LiveStep } from '@vatside/contracts/live-program';
import { scaleRecipe, type LineAmount, type MeasureSystem, type Recipe } from '@vatside/dye-kit';
import { formatAmount } from '../../../lib/format.ts';

/** The program's recipe as dye-kit reads it (the server stores lines with ids and shelf links). */
function toRecipe(recipe: LiveProgramPot['recipe']): Recipe {
  return {
    weightOfGoodsG: recipe.weightOfGoodsG,
    liquorRatio: recipe.liquorRatio,
    acid: recipe.acid,
    lines: recipe.lines.map((line) =>
      line.kind === 'stock'
        ? {
            kind: 'stock',
            dyeName: line.dyeName,
            stockStrengthPct: line.stockStrengthPct,
            depthOfShadePct: line.depthOfShadePct,
          }
        : {
            kind: 'foodColor',
            colorName: line.colorName,
            amountPer100g: line.amountPer100g,
            unit: line.unit,
            ...(line.dropsPerMl !== undefined ? { dropsPerMl: line.dropsPerMl } : {}),
          },
    ),
  };
}

export type StepAmount = {
  name: string;
  /** What is weighed or measured in metric: mL of stock with its grams of dye, drops or gel. */
  metric: string;
  /** The same at the kitchen counter, as dye-kit rounds it. */
  household: string | null;
  weightOfGoodsG: number;
};

function metricLabel(line: LineAmount): string {
  if (line.kind === 'stock') {
    return `${formatAmount(line.amount)} mL of stock (${formatAmount(line.dyeMassG ?? 0)} g dye)`;
  }
  if (line.unit === 'drop') {
    const drops = formatAmount(line.measurement.roundedAmount);
    return `${drops} drops (≈ ${formatAmount(line.volumeMl ?? 0)} mL)`;
  }
  if (line.unit === 'gGel') return `${formatAmount(line.amount)} g of gel`;
  return `${formatAmount(line.amount)} mL`;
}

/** How it is measured at home; null where the metric amount already says it (drops, gel). */
function householdLabel(line: LineAmount): string | null {
  const { measurement } = line;
  if (measurement.tooSmall) return 'too little for a spoon: use a syringe or a weaker stock';
  if (measurement.household) return measurement.household.label;
  return line.unit === 'gGel' ? 'weigh it on a 0.01 g scale' : null;
}

/**
 * The amount a step measures, for the host's own skein (the recipe's weight of goods). Null for
 * steps that measure nothing, or a line that can no longer be scaled.
 */
export function stepAmount(
  pot: LiveProgramPot,
  step: LiveStep | undefined,
  system: MeasureSystem,
): StepAmount | null {
  if (!step?.recipeLineId) return null;
  const lineIndex = pot.recipe.lines.findIndex((line) => line.id === step.recipeLineId);
  if (lineIndex === -1) return null;
  try {
    const scaled = scaleRecipe(toRecipe(pot.recipe), {
      weightOfGoodsG: pot.recipe.weightOfGoodsG,
      system,
    });
    const line = scaled.lines[lineIndex];
    if (!line) return null;
    return {
      name: line.name,
      metric: metricLabel(line),
      household: householdLabel(line),
      weightOfGoodsG: pot.recipe.weightOfGoodsG,
    };
  } catch {
    return null;
  }
}

/** The note a quick "amount" button writes: short enough for a phone's lock screen. */
export function amountNote(colorwayName: string, amount: StepAmount): string {
  const measured = amount.household ? `${amount.metric} = ${amount.household}` : amount.metric;
  return `${colorwayName}: ${amount.name}, ${measured} for a ${formatAmount(amount.weightOfGoodsG)} g skein. Amounts on your phone are scaled to your skein.`.slice(
    0,
    280,
  );
}
