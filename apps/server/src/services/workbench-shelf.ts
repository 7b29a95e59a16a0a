import { and, asc, count, desc, eq } from '@vatside/db/sql';
import { colorantById, dyeMassInStockG } from '@vatside/dye-kit';
import type {
  Dye,
  DyeList,
  StockAdjustment,
  StockSolution,
  StockSolutionDetail,
  StockSolutionList,
  dyeCreateSchema,
  dyeUpdateSchema,
  stockAdjustmentCreateSchema,
  stockSolutionCreateSchema,
  stockSolutionUpdateSchema,
} from '@vatside/contracts/workbench-shelf';
import type { PageQuery } from '@vatside/contracts/workbench-common';
import type { Database } from '@vatside/db/client';
import { dyes, stockAdjustments, stockSolutions, user } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { isoTimestamps, pageInfo, pgErrorCode, unknownReference } from './workbench-common.ts';

// The dye shelf: dyes, the stock solutions mixed from them, and hand corrections of jars.

type DyeRow = typeof dyes.$inferSelect;

function toDye(row: DyeRow): Dye {
  const colorantIds = row.colorantIds as Dye['colorantIds'];
  return {
    id: row.id,
    kind: row.kind,
    name: row.name,
    colorantIds,
    colorants: colorantIds.flatMap((id) => {
      const c = colorantById(id);
      return c ? [{ id: c.id, fdcName: c.fdcName, euNumber: c.euNumber }] : [];
    }),
    swatchHex: row.swatchHex,
    ...isoTimestamps(row),
  };
}

const inStudio = (studioId: string, id: string) =>
  and(eq(dyes.studioId, studioId), eq(dyes.id, id));

export async function listDyes(db: Database, studioId: string, page: PageQuery): Promise<DyeList> {
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(dyes)
      .where(eq(dyes.studioId, studioId))
      .orderBy(asc(dyes.name), asc(dyes.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(dyes).where(eq(dyes.studioId, studioId)),
  ]);
  return { items: rows.map(toDye), page: pageInfo(page, total?.n ?? 0) };
}

export async function findDye(db: Database, studioId: string, dyeId: string) {
  const [row] = await db.select().from(dyes).where(inStudio(studioId, dyeId));
  return row;
}

export async function getDye(db: Database, studioId: string, dyeId: string): Promise<Dye> {
  const row = await findDye(db, studioId, dyeId);
  if (!row) throw notFound('That dye');
  return toDye(row);
}

export async function createDye(
  db: Database,
  studioId: string,
  input: z.output<typeof dyeCreateSchema>,
): Promise<Dye> {
  const [row] = await db
    .insert(dyes)
    .values({ studioId, ...input })
    .returning();
  return toDye(row!);
}

export async function updateDye(
  db: Database,
  studioId: string,
  dyeId: string,
  patch: z.output<typeof dyeUpdateSchema>,
): Promise<Dye> {
  const [row] = await db.update(dyes).set(patch).where(inStudio(studioId, dyeId)).returning();
  if (!row) throw notFound('That dye');
  return toDye(row);
}

const dyeInUse = () =>
  new HttpError(
    409,
    'CONFLICT',
    'This dye has stock solutions on the shelf; delete or use up those jars first.',
  );

export async function deleteDye(db: Database, studioId: string, dyeId: string): Promise<void> {
  if (!(await findDye(db, studioId, dyeId))) throw notFound('That dye');
  const [jars] = await db
    .select({ n: count() })
    .from(stockSolutions)
    .where(eq(stockSolutions.dyeId, dyeId));
  if ((jars?.n ?? 0) > 0) throw dyeInUse();
  try {
    await db.delete(dyes).where(inStudio(studioId, dyeId));
  } catch (error) {
    // A jar mixed between the count and the delete: the foreign key refuses.
    if (pgErrorCode(error) === '23503') throw dyeInUse();
    throw error;
  }
}

const stockColumns = {
  stock: stockSolutions,
  dyeName: dyes.name,
  dyeKind: dyes.kind,
  swatchHex: dyes.swatchHex,
};

type StockJoined = {
  stock: typeof stockSolutions.$inferSelect;
  dyeName: string;
  dyeKind: DyeRow['kind'];
  swatchHex: string;
};

function toStock({ stock, dyeName, dyeKind, swatchHex }: StockJoined): StockSolution {
  return {
    id: stock.id,
    dyeId: stock.dyeId,
    dyeName,
    dyeKind,
    swatchHex,
    stockStrengthPct: stock.stockStrengthPct,
    volumeMadeMl: stock.volumeMadeMl,
    madeOn: stock.madeOn,
    volumeLeftMl: stock.volumeLeftMl,
    dyeLeftG: dyeMassInStockG({
      stockStrengthPct: stock.stockStrengthPct,
      volumeMl: stock.volumeLeftMl,
    }),
    ...isoTimestamps(stock),
  };
}

const stockInStudio = (studioId: string, id: string) =>
  and(eq(stockSolutions.studioId, studioId), eq(stockSolutions.id, id));

export async function listStockSolutions(
  db: Database,
  studioId: string,
  page: PageQuery,
): Promise<StockSolutionList> {
  const [rows, [total]] = await Promise.all([
    db
      .select(stockColumns)
      .from(stockSolutions)
      .innerJoin(dyes, eq(dyes.id, stockSolutions.dyeId))
      .where(eq(stockSolutions.studioId, studioId))
      .orderBy(desc(stockSolutions.madeOn), asc(dyes.name), asc(stockSolutions.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(stockSolutions).where(eq(stockSolutions.studioId, studioId)),
  ]);
  return { items: rows.map(toStock), page: pageInfo(page, total?.n ?? 0) };
}

export async function findStockSolution(db: Database, studioId: string, stockId: string) {
  const [row] = await db
    .select(stockColumns)
    .from(stockSolutions)
    .innerJoin(dyes, eq(dyes.id, stockSolutions.dyeId))
    .where(stockInStudio(studioId, stockId));
  return row;
}

async function stockOrThrow(db: Database, studioId: string, stockId: string) {
  const row = await findStockSolution(db, studioId, stockId);
  if (!row) throw notFound('That stock solution');
  return toStock(row);
}

export async function getStockSolution(
  db: Database,
  studioId: string,
  stockId: string,
): Promise<StockSolutionDetail> {
  const stock = await stockOrThrow(db, studioId, stockId);
  const adjustments = await db
    .select({ adjustment: stockAdjustments, adjustedByName: user.name })
    .from(stockAdjustments)
    .leftJoin(user, eq(user.id, stockAdjustments.adjustedBy))
    .where(eq(stockAdjustments.stockSolutionId, stockId))
    .orderBy(desc(stockAdjustments.createdAt))
    .limit(50);
  return {
    ...stock,
    adjustments: adjustments.map(({ adjustment, adjustedByName }): StockAdjustment => ({
      id: adjustment.id,
      volumeLeftBeforeMl: adjustment.volumeLeftBeforeMl,
      volumeLeftAfterMl: adjustment.volumeLeftAfterMl,
      reason: adjustment.reason,
      adjustedByName,
      createdAt: adjustment.createdAt.toISOString(),
    })),
  };
}

async function requireDye(db: Database, studioId: string, dyeId: string) {
  if (!(await findDye(db, studioId, dyeId))) throw unknownReference('dyeId', 'dye');
}

export async function createStockSolution(
  db: Database,
  studioId: string,
  input: z.output<typeof stockSolutionCreateSchema>,
): Promise<StockSolution> {
  await requireDye(db, studioId, input.dyeId);
  const [row] = await db
    .insert(stockSolutions)
    .values({ studioId, ...input, volumeLeftMl: input.volumeLeftMl ?? input.volumeMadeMl })
    .returning({ id: stockSolutions.id });
  return stockOrThrow(db, studioId, row!.id);
}

export async function updateStockSolution(
  db: Database,
  studioId: string,
  stockId: string,
  patch: z.output<typeof stockSolutionUpdateSchema>,
): Promise<StockSolution> {
  const current = await stockOrThrow(db, studioId, stockId);
  if (patch.dyeId) await requireDye(db, studioId, patch.dyeId);
  if (patch.volumeMadeMl !== undefined && patch.volumeMadeMl < current.volumeLeftMl) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'The jar holds more than that.', {
      volumeMadeMl: [
        `${current.volumeLeftMl} mL are left in the jar; adjust what is left first, with a reason.`,
      ],
    });
  }
  await db.update(stockSolutions).set(patch).where(stockInStudio(studioId, stockId));
  return stockOrThrow(db, studioId, stockId);
}

export async function deleteStockSolution(
  db: Database,
  studioId: string,
  stockId: string,
): Promise<void> {
  const deleted = await db
    .delete(stockSolutions)
    .where(stockInStudio(studioId, stockId))
    .returning({ id: stockSolutions.id });
  if (deleted.length === 0) throw notFound('That stock solution');
}

/** Sets what is left in the jar, logging the before and after with the host's reason. */
export async function adjustStockSolution(
  db: Database,
  studioId: string,
  stockId: string,
  adjustedBy: string,
  input: z.output<typeof stockAdjustmentCreateSchema>,
): Promise<StockSolutionDetail> {
  await db.transaction(async (tx) => {
    const [jar] = await tx
      .select()
      .from(stockSolutions)
      .where(stockInStudio(studioId, stockId))
      .for('update');
    if (!jar) throw notFound('That stock solution');
    if (input.volumeLeftMl > jar.volumeMadeMl) {
      throw new HttpError(400, 'VALIDATION_FAILED', 'A jar cannot hold more than was made.', {
        volumeLeftMl: [`Only ${jar.volumeMadeMl} mL were made.`],
      });
    }
    await tx.insert(stockAdjustments).values({
      stockSolutionId: stockId,
      volumeLeftBeforeMl: jar.volumeLeftMl,
      volumeLeftAfterMl: input.volumeLeftMl,
      reason: input.reason,
      adjustedBy,
    });
    await tx
      .update(stockSolutions)
      .set({ volumeLeftMl: input.volumeLeftMl })
      .where(eq(stockSolutions.id, stockId));
  });
  return getStockSolution(db, studioId, stockId);
}
