import { toDyeKitRecipe } from '@vatside/contracts/recipe';
import { randomUUID } from 'node:crypto';
import { and, count, desc, eq, notInArray } from '@vatside/db/sql';
import {
  acidFor,
  recipeWarnings,
  scaleRecipe,
  validateRecipe,
  type DyeKitWarning,
  type FiberPart,
  type MeasureSystem,
  type Recipe,
  type ScaleTarget,
} from '@vatside/dye-kit';
import { DYE_SAFETY_NOTE, type PageQuery } from '@vatside/contracts/workbench-common';
import type {
  ColorwayDetail,
  ColorwayList,
  ColorwaySummary,
  ComputedAmounts,
  RecipeLineInput,
  colorwayCreateSchema,
  colorwayUpdateSchema,
} from '@vatside/contracts/workbench-colorways';
import type { Database } from '@vatside/db/client';
import { colorways, runSheetSteps, type StoredRecipeLine } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { findBase, findPot } from './workbench-bases.ts';
import { isoTimestamps, pageInfo, unknownReference, withDyeKit } from './workbench-common.ts';
import { findDye, findStockSolution } from './workbench-shelf.ts';

// Colorways: the recipe as the host wrote it for their skein, with dye-kit's amounts and warnings.

type ColorwayRow = typeof colorways.$inferSelect;
type ColorwayCreate = z.output<typeof colorwayCreateSchema>;
type ColorwayPatch = z.output<typeof colorwayUpdateSchema>;

const toSummary = (row: ColorwayRow): ColorwaySummary => ({
  id: row.id,
  name: row.name,
  technique: row.technique,
  baseId: row.baseId,
  potId: row.potId,
  skeinCount: row.skeinCount,
  weightOfGoodsG: row.weightOfGoodsG,
  liquorRatio: row.liquorRatio,
  acid: row.acid,
  recipeLines: row.recipeLines as ColorwaySummary['recipeLines'],
  targetSwatches: row.targetSwatches,
  notes: row.notes,
  ...isoTimestamps(row),
});

/** dye-kit names recipe fields `lines[2].x`; the API calls them `recipeLines.2.x`. */
function checkRecipe(recipe: Recipe): void {
  try {
    withDyeKit('', () => validateRecipe(recipe));
  } catch (error) {
    if (error instanceof HttpError && error.fields) {
      const fields = Object.fromEntries(
        Object.entries(error.fields).map(([k, v]) => [
          k.replace(/^lines\[(\d+)\]/, 'recipeLines.$1'),
          v,
        ]),
      );
      throw new HttpError(error.status, error.code, error.message, fields);
    }
    throw error;
  }
}

/** Fills lines that point at the shelf with the jar's dye and strength, or the dye's name. */
async function resolveLines(
  db: Database,
  studioId: string,
  lines: RecipeLineInput[],
): Promise<StoredRecipeLine[]> {
  const resolved: StoredRecipeLine[] = [];
  for (const [i, line] of lines.entries()) {
    const id = line.id ?? randomUUID();
    if (line.kind === 'stock') {
      const jar = line.stockSolutionId
        ? await findStockSolution(db, studioId, line.stockSolutionId)
        : undefined;
      if (line.stockSolutionId && !jar)
        throw unknownReference(`recipeLines.${i}.stockSolutionId`, 'stock solution');
      resolved.push({
        id,
        kind: 'stock',
        stockSolutionId: line.stockSolutionId ?? null,
        dyeName: line.dyeName ?? jar!.dyeName,
        stockStrengthPct: line.stockStrengthPct ?? jar!.stock.stockStrengthPct,
        depthOfShadePct: line.depthOfShadePct,
      });
    } else {
      const dye = line.dyeId ? await findDye(db, studioId, line.dyeId) : undefined;
      if (line.dyeId && !dye) throw unknownReference(`recipeLines.${i}.dyeId`, 'dye');
      const colorants = line.colorants ?? (dye?.colorantIds.length ? dye.colorantIds : undefined);
      resolved.push({
        id,
        kind: 'foodColor',
        dyeId: line.dyeId ?? null,
        colorName: line.colorName ?? dye!.name,
        amountPer100g: line.amountPer100g,
        unit: line.unit,
        ...(line.dropsPerMl !== undefined ? { dropsPerMl: line.dropsPerMl } : {}),
        ...(colorants ? { colorants } : {}),
      });
    }
  }
  if (new Set(resolved.map((l) => l.id)).size !== resolved.length) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'Two recipe lines share an id.', {
      recipeLines: ['Each line needs its own id.'],
    });
  }
  return resolved;
}

async function checkReferences(
  db: Database,
  studioId: string,
  refs: { baseId?: string | null; potId?: string | null },
) {
  if (refs.baseId && !(await findBase(db, studioId, refs.baseId)))
    throw unknownReference('baseId', 'base');
  if (refs.potId && !(await findPot(db, studioId, refs.potId)))
    throw unknownReference('potId', 'pot');
}

const inStudio = (studioId: string, id: string) =>
  and(eq(colorways.studioId, studioId), eq(colorways.id, id));

export async function findColorway(db: Database, studioId: string, colorwayId: string) {
  const [row] = await db.select().from(colorways).where(inStudio(studioId, colorwayId));
  return row;
}

export async function colorwayOrThrow(db: Database, studioId: string, colorwayId: string) {
  const row = await findColorway(db, studioId, colorwayId);
  if (!row) throw notFound('That colorway');
  return row;
}

export async function listColorways(
  db: Database,
  studioId: string,
  page: PageQuery,
): Promise<ColorwayList> {
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(colorways)
      .where(eq(colorways.studioId, studioId))
      .orderBy(desc(colorways.updatedAt), desc(colorways.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(colorways).where(eq(colorways.studioId, studioId)),
  ]);
  return { items: rows.map(toSummary), page: pageInfo(page, total?.n ?? 0) };
}

/** Warnings from several dye-kit calls, each once. */
function uniqueWarnings(...lists: DyeKitWarning[][]): DyeKitWarning[] {
  const seen = new Set<string>();
  return lists.flat().filter((w) => {
    const key = `${w.code}|${w.lineIndex ?? ''}|${w.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/**
 * dye-kit's amounts for a target (a weight, or N of the host's skeins), the acid with its
 * common-practice rule, and the real-pot warnings for the colorway's base and pot.
 */
export async function computeAmounts(
  db: Database,
  row: ColorwayRow,
  target: { weightOfGoodsG: number } | { skeins: number },
  options: { system: MeasureSystem; potCapacityMl?: number },
): Promise<ComputedAmounts> {
  const [base, pot] = await Promise.all([
    row.baseId ? findBase(db, row.studioId, row.baseId) : undefined,
    row.potId ? findPot(db, row.studioId, row.potId) : undefined,
  ]);
  const recipe = toDyeKitRecipe(row, row.recipeLines);
  const potCapacityMl = options.potCapacityMl ?? pot?.capacityMl;
  const scaleTarget: ScaleTarget = {
    ...target,
    system: options.system,
    ...(potCapacityMl !== undefined ? { potCapacityMl } : {}),
  };
  const amounts = withDyeKit('', () => scaleRecipe(recipe, scaleTarget));
  const acid = withDyeKit('acid', () =>
    acidFor({
      weightOfGoodsG: amounts.weightOfGoodsG,
      bathVolumeMl: amounts.bathVolumeMl,
      ...(row.acid.acid === 'vinegar'
        ? { acid: 'vinegar', acidStrengthPct: row.acid.acidStrengthPct }
        : { acid: 'citric' }),
    }),
  );
  const potWarnings = withDyeKit('', () =>
    recipeWarnings(recipe, {
      weightOfGoodsG: amounts.weightOfGoodsG,
      system: options.system,
      ...(potCapacityMl !== undefined ? { potCapacityMl } : {}),
      ...(pot ? { potMaterial: pot.material } : {}),
      ...(base
        ? { fiberContent: base.fiberContent as FiberPart[], superwash: base.superwash }
        : {}),
    }),
  );
  return {
    system: options.system,
    amounts,
    acid,
    warnings: uniqueWarnings(amounts.warnings, acid.warnings, potWarnings),
    safetyNote: DYE_SAFETY_NOTE,
  };
}

export async function getColorway(
  db: Database,
  studioId: string,
  colorwayId: string,
  system: MeasureSystem,
): Promise<ColorwayDetail> {
  const row = await colorwayOrThrow(db, studioId, colorwayId);
  const computed = await computeAmounts(db, row, { skeins: row.skeinCount }, { system });
  return { ...toSummary(row), computed };
}

export async function createColorway(
  db: Database,
  studioId: string,
  input: ColorwayCreate,
): Promise<ColorwaySummary> {
  await checkReferences(db, studioId, input);
  const base = input.baseId ? await findBase(db, studioId, input.baseId) : undefined;
  const weightOfGoodsG = input.weightOfGoodsG ?? base?.skeinWeightG;
  if (weightOfGoodsG === undefined) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'How much does one skein weigh?', {
      weightOfGoodsG: ['Give the dry weight of one skein, or pick a base.'],
    });
  }
  const recipeLines = await resolveLines(db, studioId, input.recipeLines);
  const values = { ...input, studioId, weightOfGoodsG, recipeLines };
  checkRecipe(toDyeKitRecipe(values, values.recipeLines));
  const [row] = await db.insert(colorways).values(values).returning();
  return toSummary(row!);
}

export async function updateColorway(
  db: Database,
  studioId: string,
  colorwayId: string,
  patch: ColorwayPatch,
): Promise<ColorwaySummary> {
  const current = await colorwayOrThrow(db, studioId, colorwayId);
  await checkReferences(db, studioId, patch);
  const { recipeLines: lineInput, ...rest } = patch;
  const recipeLines = lineInput ? await resolveLines(db, studioId, lineInput) : undefined;
  const next = { ...current, ...rest, ...(recipeLines ? { recipeLines } : {}) };
  checkRecipe(toDyeKitRecipe(next, next.recipeLines));
  const row = await db.transaction(async (tx) => {
    const [updated] = await tx
      .update(colorways)
      .set({ ...rest, ...(recipeLines ? { recipeLines } : {}) })
      .where(inStudio(studioId, colorwayId))
      .returning();
    if (recipeLines) {
      // Steps that measured a line now gone keep their words and lose the amount.
      const kept = recipeLines.map((l) => l.id);
      await tx
        .update(runSheetSteps)
        .set({ recipeLineId: null })
        .where(
          and(
            eq(runSheetSteps.colorwayId, colorwayId),
            kept.length ? notInArray(runSheetSteps.recipeLineId, kept) : undefined,
          ),
        );
    }
    return updated!;
  });
  return toSummary(row);
}

export async function deleteColorway(
  db: Database,
  studioId: string,
  colorwayId: string,
): Promise<void> {
  const deleted = await db
    .delete(colorways)
    .where(inStudio(studioId, colorwayId))
    .returning({ id: colorways.id });
  if (deleted.length === 0) throw notFound('That colorway');
}
