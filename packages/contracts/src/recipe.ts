import type { ColorantId, Recipe, RecipeLine as DyeKitRecipeLine } from '@vatside/dye-kit';

/** A stored or sent recipe line: dye-kit's fields, plus ids and shelf links that are ignored here. */
type LineWithIds =
  | { kind: 'stock'; dyeName: string; stockStrengthPct: number; depthOfShadePct: number }
  | {
      kind: 'foodColor';
      colorName: string;
      amountPer100g: number;
      unit: 'mL' | 'drop' | 'gGel';
      dropsPerMl?: number;
      colorants?: readonly string[];
    };

export type RecipeHead = Pick<Recipe, 'weightOfGoodsG' | 'liquorRatio' | 'acid'>;

/** The dye-kit Recipe inside a colorway: the lines without our ids and shelf links. */
export function toDyeKitRecipe(head: RecipeHead, withIds: readonly LineWithIds[]): Recipe {
  const lines = withIds.map((line): DyeKitRecipeLine => {
    if (line.kind === 'stock') {
      const { dyeName, stockStrengthPct, depthOfShadePct } = line;
      return { kind: 'stock', dyeName, stockStrengthPct, depthOfShadePct };
    }
    const { colorName, amountPer100g, unit, dropsPerMl, colorants } = line;
    return {
      kind: 'foodColor',
      colorName,
      amountPer100g,
      unit,
      ...(dropsPerMl !== undefined ? { dropsPerMl } : {}),
      ...(colorants?.length ? { colorants: colorants as ColorantId[] } : {}),
    };
  });
  return {
    weightOfGoodsG: head.weightOfGoodsG,
    liquorRatio: head.liquorRatio,
    acid: head.acid,
    lines,
  };
}
