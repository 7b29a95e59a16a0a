import { toDyeKitRecipe } from '@vatside/contracts/recipe';
import type { BathRecord, BathRecordList, bathRecordInputSchema } from '@vatside/contracts/archive';
import type { Database } from '@vatside/db/client';
import {
  archivedColorways,
  bases,
  colorways,
  dyeAlongColorways,
  dyeAlongs,
  images,
  pots,
  stockSolutions,
  type StoredArchiveLine,
  type StoredArchiveSnapshot,
} from '@vatside/db/schema';
import { and, asc, eq, inArray } from '@vatside/db/sql';
import { bathAmounts, bathVolumeMl } from '@vatside/dye-kit';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import type { Tx } from '../jobs/dye-along-mail-queue.ts';
import { dyeAlongDyeLog } from '../live/dye-log.ts';
import { isUnderway } from './dye-along-rules.ts';

// The bath record of each colorway of a month, and the snapshot taken when the month is archived.

type ArchiveRow = typeof archivedColorways.$inferSelect;
type BathRecordInput = z.output<typeof bathRecordInputSchema>;
type ColorwayRow = typeof colorways.$inferSelect;

const round = (n: number, places = 2) => Number(n.toFixed(places));

/** The dye-along in this studio (dye-alongs.ts imports this module, so no import back). */
async function monthRow(db: Database, studioId: string, dyeAlongId: string) {
  const [row] = await db
    .select()
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.studioId, studioId), eq(dyeAlongs.id, dyeAlongId)));
  if (!row) throw notFound('That dye-along');
  return row;
}

async function monthColorways(db: Database, dyeAlongId: string) {
  return db
    .select({ colorway: colorways })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId))
    .orderBy(asc(dyeAlongColorways.position))
    .then((rows) => rows.map((r) => r.colorway));
}

async function monthArchiveRows(db: Database | Tx, dyeAlongId: string) {
  return db.select().from(archivedColorways).where(eq(archivedColorways.dyeAlongId, dyeAlongId));
}

/** The plan's weight and bath for the day: the snapshot's once archived, else the workbench's. */
function plannedDay(colorway: ColorwayRow, row: ArchiveRow | undefined) {
  const plan = row?.snapshot ?? colorway;
  const weight = plan.weightOfGoodsG * plan.skeinCount;
  return {
    plannedFiberWeightG: weight,
    plannedBathVolumeMl: bathVolumeMl({ weightOfGoodsG: weight, liquorRatio: plan.liquorRatio }),
  };
}

export function toBathRecord(
  colorwayId: string,
  colorwayName: string,
  planned: { plannedFiberWeightG: number; plannedBathVolumeMl: number },
  row: ArchiveRow | undefined,
): BathRecord {
  return {
    colorwayId,
    colorwayName,
    ...planned,
    fiberWeightDyedG: row?.fiberWeightDyedG ?? null,
    bathVolumeMl: row?.bathVolumeMl ?? null,
    temperatureReachedC: row?.temperatureReachedC ?? null,
    timeAtTemperatureMin: row?.timeAtTemperatureMin ?? null,
    bathExhausted: row?.bathExhausted ?? null,
    baseLot: row?.baseLot ?? '',
    dyeLots: row?.dyeLots ?? [],
    photoImageIds: row?.photoImageIds ?? [],
    notes: row?.notes ?? '',
    archivedColorwayId: row?.archivedAt ? row.id : null,
    updatedAt: row ? row.updatedAt.toISOString() : null,
  };
}

/** One record per colorway of the month, blank where the host has not written one yet. */
export async function listBathRecords(
  db: Database,
  studioId: string,
  dyeAlongId: string,
): Promise<BathRecordList> {
  const dyeAlong = await monthRow(db, studioId, dyeAlongId);
  const [list, rows] = await Promise.all([
    monthColorways(db, dyeAlongId),
    monthArchiveRows(db, dyeAlongId),
  ]);
  const byColorway = new Map(rows.map((r) => [r.colorwayId, r]));
  return {
    dyeAlongId,
    editable: isUnderway(dyeAlong.status),
    records: list.map((c) => {
      const row = byColorway.get(c.id);
      return toBathRecord(c.id, row?.snapshot?.colorwayName ?? c.name, plannedDay(c, row), row);
    }),
  };
}

/**
 * Writes a colorway's bath record (the whole record). Allowed from the day the month goes live,
 * and after it is archived too: lots and photos often come later; the snapshot never changes.
 */
export async function saveBathRecord(
  db: Database,
  studioId: string,
  dyeAlongId: string,
  colorwayId: string,
  input: BathRecordInput,
  userId: string,
): Promise<BathRecord> {
  const dyeAlong = await monthRow(db, studioId, dyeAlongId);
  if (!isUnderway(dyeAlong.status)) {
    throw new HttpError(
      409,
      'CONFLICT',
      'A bath record is written after the dye-along has gone live; this one has not yet.',
    );
  }
  const colorway = (await monthColorways(db, dyeAlongId)).find((c) => c.id === colorwayId);
  if (!colorway) throw notFound('That colorway in this dye-along');
  if (input.photoImageIds.length > 0) {
    const found = await db
      .select({ id: images.id })
      .from(images)
      .where(and(eq(images.studioId, studioId), inArray(images.id, input.photoImageIds)));
    if (found.length !== input.photoImageIds.length) {
      throw new HttpError(400, 'VALIDATION_FAILED', 'A photo is not in this studio’s images.', {
        photoImageIds: ['Pick photos from the studio’s images.'],
      });
    }
  }
  const values = { ...input, recordedBy: userId };
  const [row] = await db
    .insert(archivedColorways)
    .values({ studioId, dyeAlongId, colorwayId, ...values })
    .onConflictDoUpdate({
      target: [archivedColorways.dyeAlongId, archivedColorways.colorwayId],
      set: values,
    })
    .returning();
  return toBathRecord(
    colorwayId,
    row!.snapshot?.colorwayName ?? colorway.name,
    plannedDay(colorway, row),
    row,
  );
}

export interface MonthSnapshot {
  colorwayId: string;
  snapshot: StoredArchiveSnapshot;
}

/**
 * What each colorway of the month looks like now: its recipe, base, pot and swatches as the
 * workbench holds them, with the dye log's totals per recipe line (public live sessions only).
 * Read before the archiving transaction; it only reads.
 */
export async function monthSnapshots(
  db: Database,
  studioId: string,
  dyeAlongId: string,
): Promise<MonthSnapshot[]> {
  const [list, log] = await Promise.all([
    monthColorways(db, dyeAlongId),
    dyeAlongDyeLog(db, studioId, dyeAlongId),
  ]);
  const baseIds = list.map((c) => c.baseId).filter((id) => id !== null);
  const potIds = list.map((c) => c.potId).filter((id) => id !== null);
  const jarIds = list.flatMap((c) =>
    c.recipeLines.flatMap((l) =>
      l.kind === 'stock' && l.stockSolutionId ? [l.stockSolutionId] : [],
    ),
  );
  const [baseRows, potRows, jarRows] = await Promise.all([
    baseIds.length ? db.select().from(bases).where(inArray(bases.id, baseIds)) : [],
    potIds.length ? db.select().from(pots).where(inArray(pots.id, potIds)) : [],
    jarIds.length
      ? db
          .select({ id: stockSolutions.id, dyeId: stockSolutions.dyeId })
          .from(stockSolutions)
          .where(inArray(stockSolutions.id, jarIds))
      : [],
  ]);
  const jarDye = new Map(jarRows.map((j) => [j.id, j.dyeId]));
  return list.map((colorway) => {
    const logged = log.colorways.find((p) => p.potId === colorway.id);
    const { recipeLines } = colorway;
    const recipe = toDyeKitRecipe(colorway, recipeLines);
    const plannedAmounts = bathAmounts(recipe, colorway.weightOfGoodsG * colorway.skeinCount);
    const lines = recipeLines.map((line, i): StoredArchiveLine => {
      const logLine = logged?.lines.find((l) => l.recipeLineId === line.id);
      const anyEntry = logged?.entries.some((e) => e.recipeLineId === line.id) ?? false;
      return {
        recipeLineId: line.id,
        kind: line.kind,
        name: line.kind === 'stock' ? `${line.dyeName} ${line.stockStrengthPct} %` : line.colorName,
        unit: line.kind === 'stock' ? 'mL' : line.unit,
        dyeId:
          line.kind === 'stock'
            ? line.stockSolutionId
              ? (jarDye.get(line.stockSolutionId) ?? null)
              : null
            : line.dyeId,
        plannedAmount: round(plannedAmounts.lines[i]!.amount),
        loggedAmount: anyEntry && logLine ? logLine.loggedAmount : null,
      };
    });
    const base = baseRows.find((b) => b.id === colorway.baseId);
    const pot = potRows.find((p) => p.id === colorway.potId);
    return {
      colorwayId: colorway.id,
      snapshot: {
        colorwayName: colorway.name,
        technique: colorway.technique,
        baseId: base?.id ?? null,
        baseName: base?.name ?? null,
        baseFiberContent: base?.fiberContent ?? null,
        potId: pot?.id ?? null,
        potName: pot?.name ?? null,
        potCapacityMl: pot?.capacityMl ?? null,
        weightOfGoodsG: colorway.weightOfGoodsG,
        skeinCount: colorway.skeinCount,
        liquorRatio: colorway.liquorRatio,
        acid: colorway.acid,
        recipeLines,
        targetSwatches: colorway.targetSwatches,
        colorwayNotes: colorway.notes,
        lines,
      },
    };
  });
}

/** Freezes the month's snapshots beside the bath records (inside the archiving transaction). */
export async function writeMonthSnapshots(
  tx: Tx,
  studioId: string,
  dyeAlongId: string,
  snapshots: MonthSnapshot[],
  now: Date,
): Promise<void> {
  for (const { colorwayId, snapshot } of snapshots) {
    await tx
      .insert(archivedColorways)
      .values({ studioId, dyeAlongId, colorwayId, snapshot, archivedAt: now })
      .onConflictDoUpdate({
        target: [archivedColorways.dyeAlongId, archivedColorways.colorwayId],
        set: { snapshot, archivedAt: now },
      });
  }
}
