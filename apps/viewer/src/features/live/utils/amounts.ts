import type { LiveProgramPot, LiveStep } from '@vatside/contracts/live-program';
import {
  DEFAULT_DROPS_PER_ML,
  scaleRecipe,
  type DyeKitWarning,
  type LineAmount,
  type Recipe,
  type ScaledRecipe,
} from '@vatside/dye-kit';
import type { Kit } from '../../../lib/kit.ts';

/**
 * The program's recipe as dye-kit reads it. The host counted drops with their own dropper: its
 * calibration, or the usual 20 per mL, turns them into mL; the viewer's dropper turns mL back
 * into drops (see `dropsWithYourDropper`).
 */
export function toRecipe(recipe: LiveProgramPot['recipe']): Recipe {
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
            dropsPerMl: line.dropsPerMl ?? DEFAULT_DROPS_PER_ML,
          },
    ),
  };
}

/** The pot's recipe for the viewer's skein, or null when the recipe cannot be scaled. */
export function scalePot(pot: LiveProgramPot, kit: Kit): ScaledRecipe | null {
  try {
    return scaleRecipe(toRecipe(pot.recipe), {
      weightOfGoodsG: kit.skeinWeightG,
      system: kit.system,
      dropsPerMl: kit.dropsPerMl,
    });
  } catch {
    return null;
  }
}

/** The recipe line a step measures; lines keep their order, so its position is dye-kit's index. */
export function stepLineIndex(pot: LiveProgramPot, step: LiveStep): number | null {
  if (!step.recipeLineId) return null;
  const index = pot.recipe.lines.findIndex((line) => line.id === step.recipeLineId);
  return index === -1 ? null : index;
}

export type StepAmount = { line: LineAmount; warnings: DyeKitWarning[] };

export function amountForLine(scaled: ScaledRecipe, lineIndex: number): StepAmount | null {
  const line = scaled.lines[lineIndex];
  if (!line) return null;
  return { line, warnings: scaled.warnings.filter((w) => w.lineIndex === lineIndex) };
}

/** How many drops of the viewer's dropper hold a volume (approximate by nature). */
export function dropsWithYourDropper(volumeMl: number, kit: Kit): number {
  return Math.round(volumeMl * kit.dropsPerMl);
}
