import { tz } from '@date-fns/tz';
import { format } from 'date-fns';
import { toDyeKitRecipe } from '@vatside/contracts/recipe';
import type {
  ArchiveList,
  ArchivedColorwayDetail,
  ArchivedColorwaySummary,
  DyeAgain,
  ShelfCheck,
  archiveSearchQuerySchema,
  dyeAgainQuerySchema,
} from '@vatside/contracts/archive';
import { DYE_SAFETY_NOTE } from '@vatside/contracts/workbench-common';
import type { Database } from '@vatside/db/client';
import {
  archivedColorways,
  bases,
  dyeAlongs,
  images,
  pots,
  stockSolutions,
  type StoredArchiveSnapshot,
} from '@vatside/db/schema';
import { and, desc, eq, inArray, isNotNull } from '@vatside/db/sql';
import {
  deltaE2000,
  depthOfShade,
  dyeMassInStockG,
  hexToLab,
  recipeFromLog,
  scaleRecipe,
  stockShortfall,
  type MeasureSystem,
} from '@vatside/dye-kit';
import type { z } from 'zod';
import { notFound } from '../http/errors.ts';
import { toBathRecord } from './archive-records.ts';
import { pageInfo, withDyeKit } from './workbench-common.ts';

// The archive of finished colorways: search, the record of one, and dyeing it again.

type SearchQuery = z.output<typeof archiveSearchQuerySchema>;
type DyeAgainQuery = z.output<typeof dyeAgainQuerySchema>;
type ArchiveRow = typeof archivedColorways.$inferSelect & { snapshot: StoredArchiveSnapshot };
type MonthRow = Pick<typeof dyeAlongs.$inferSelect, 'id' | 'title' | 'startsAt' | 'timeZone'>;

const round = (n: number, places = 2) => Number(n.toFixed(places));

/** The month a colorway was dyed, on the host's calendar. */
const monthOf = (m: MonthRow) => format(m.startsAt, 'yyyy-MM', { in: tz(m.timeZone) });
const monthLabelOf = (m: MonthRow) => format(m.startsAt, 'MMMM yyyy', { in: tz(m.timeZone) });

/** Every archived colorway of the studio with its month, newest month first. */
async function archivedRows(db: Database, studioId: string, id?: string) {
  const rows = await db
    .select({
      row: archivedColorways,
      month: {
        id: dyeAlongs.id,
        title: dyeAlongs.title,
        startsAt: dyeAlongs.startsAt,
        timeZone: dyeAlongs.timeZone,
      },
    })
    .from(archivedColorways)
    .innerJoin(dyeAlongs, eq(dyeAlongs.id, archivedColorways.dyeAlongId))
    .where(
      and(
        eq(archivedColorways.studioId, studioId),
        isNotNull(archivedColorways.archivedAt),
        id ? eq(archivedColorways.id, id) : undefined,
      ),
    )
    .orderBy(desc(dyeAlongs.startsAt), desc(archivedColorways.id));
  return rows.map(({ row, month }) => ({ row: row as ArchiveRow, month }));
}

type Swatch = { hex: string; name: string };

/**
 * A colorway's colors for search and lists: its target swatches, or when it was planned without
 * any, the colors found in the photos of its finished skeins (each workbench image keeps its
 * palette), so a colorway is found by color either way.
 */
async function colorsOf(db: Database, rows: ArchiveRow[]): Promise<Map<string, Swatch[]>> {
  const untargeted = rows.filter((r) => r.snapshot.targetSwatches.length === 0);
  const imageIds = [...new Set(untargeted.flatMap((r) => r.photoImageIds))];
  const palettes = new Map<string, Swatch[]>();
  if (imageIds.length > 0) {
    const found = await db
      .select({ id: images.id, palette: images.palette })
      .from(images)
      .where(inArray(images.id, imageIds));
    for (const image of found) {
      palettes.set(
        image.id,
        image.palette.map((s) => ({ hex: s.hex, name: s.label || s.name })),
      );
    }
  }
  return new Map(
    rows.map((r) => [
      r.id,
      r.snapshot.targetSwatches.length > 0
        ? r.snapshot.targetSwatches
        : r.photoImageIds.flatMap((id) => palettes.get(id) ?? []),
    ]),
  );
}

function toSummary(
  row: ArchiveRow,
  month: MonthRow,
  swatches: Swatch[],
  deltaE: number | null,
): ArchivedColorwaySummary {
  const s = row.snapshot;
  return {
    id: row.id,
    colorwayName: s.colorwayName,
    technique: s.technique as ArchivedColorwaySummary['technique'],
    dyeAlongId: month.id,
    dyeAlongTitle: month.title,
    month: monthOf(month),
    monthLabel: monthLabelOf(month),
    baseName: s.baseName,
    dyeNames: s.lines.map((l) => l.name),
    swatches,
    deltaE2000: deltaE === null ? null : round(deltaE),
    archivedAt: row.archivedAt!.toISOString(),
  };
}

/** The smallest CIEDE2000 from the color to any of the colorway's swatches; none: no match. */
function nearestDeltaE(swatches: Swatch[], hex: string): number | null {
  const target = hexToLab(hex);
  const distances = swatches.map((s) => deltaE2000(target, hexToLab(s.hex)));
  return distances.length ? Math.min(...distances) : null;
}

/**
 * Search by month, base and dye (filters), and by color: nearest first by CIEDE2000 (Sharma et
 * al. 2005, dye-kit) to any of the colorway's colors (see colorsOf). A studio archives a handful of
 * colorways a month, so the filtering and the color distance run here rather than in SQL.
 */
export async function searchArchive(
  db: Database,
  studioId: string,
  query: SearchQuery,
): Promise<ArchiveList> {
  const rows = (await archivedRows(db, studioId))
    .filter(({ month }) => !query.month || monthOf(month) === query.month)
    .filter(({ row }) => !query.baseId || row.snapshot.baseId === query.baseId)
    .filter(({ row }) => !query.dyeId || row.snapshot.lines.some((l) => l.dyeId === query.dyeId));
  const colors = await colorsOf(
    db,
    rows.map((r) => r.row),
  );
  let found = rows.map(({ row, month }) => {
    const swatches = colors.get(row.id) ?? [];
    return { row, month, swatches, deltaE: query.hex ? nearestDeltaE(swatches, query.hex) : null };
  });
  if (query.hex) {
    found = found
      .filter((f) => f.deltaE !== null)
      .sort((a, b) => a.deltaE! - b.deltaE! || a.row.id.localeCompare(b.row.id));
  }
  return {
    items: found
      .slice(query.offset, query.offset + query.limit)
      .map((f) => toSummary(f.row, f.month, f.swatches, f.deltaE)),
    page: pageInfo(query, found.length),
  };
}

async function archivedOrThrow(db: Database, studioId: string, id: string) {
  const [found] = await archivedRows(db, studioId, id);
  if (!found) throw notFound('That archived colorway');
  return found;
}

/** The fiber the logged amounts went onto: the host's measure, else the plan's skeins. */
const fiberDyedG = (row: ArchiveRow) =>
  row.fiberWeightDyedG ?? row.snapshot.weightOfGoodsG * row.snapshot.skeinCount;

export async function archivedColorwayDetail(
  db: Database,
  studio: { id: string; slug: string },
  id: string,
): Promise<ArchivedColorwayDetail> {
  const { row, month } = await archivedOrThrow(db, studio.id, id);
  const s = row.snapshot;
  const fiberG = fiberDyedG(row);
  const photoRows = row.photoImageIds.length
    ? await db
        .select({ id: images.id })
        .from(images)
        .where(and(eq(images.studioId, studio.id), inArray(images.id, row.photoImageIds)))
    : [];
  const kept = new Set(photoRows.map((p) => p.id));
  const plannedWeight = s.weightOfGoodsG * s.skeinCount;
  const { archivedColorwayId: _omit, ...bathRecord } = toBathRecord(
    row.colorwayId ?? row.id,
    s.colorwayName,
    {
      plannedFiberWeightG: plannedWeight,
      plannedBathVolumeMl: plannedWeight * s.liquorRatio,
    },
    row,
  );
  return {
    ...toSummary(row, month, (await colorsOf(db, [row])).get(row.id) ?? [], null),
    baseId: s.baseId,
    potName: s.potName,
    weightOfGoodsG: s.weightOfGoodsG,
    skeinCount: s.skeinCount,
    liquorRatio: s.liquorRatio,
    acid: s.acid,
    colorwayNotes: s.colorwayNotes,
    lines: s.lines.map((line, i) => {
      const recipeLine = s.recipeLines[i];
      const strength = recipeLine?.kind === 'stock' ? recipeLine.stockStrengthPct : null;
      // Depth of shade reached = dye mass ÷ fiber dyed × 100 (common practice).
      const reached =
        strength !== null && line.loggedAmount !== null
          ? depthOfShade({
              dyeMassG: dyeMassInStockG({
                stockStrengthPct: strength,
                volumeMl: line.loggedAmount,
              }),
              weightOfGoodsG: fiberG,
            })
          : null;
      return {
        recipeLineId: line.recipeLineId,
        kind: line.kind,
        name: line.name,
        unit: line.unit,
        plannedAmount: line.plannedAmount,
        actualAmount: line.loggedAmount,
        differencePct:
          line.loggedAmount === null || line.plannedAmount === 0
            ? null
            : round(((line.loggedAmount - line.plannedAmount) / line.plannedAmount) * 100, 1),
        plannedDepthOfShadePct: recipeLine?.kind === 'stock' ? recipeLine.depthOfShadePct : null,
        actualDepthOfShadePct: reached === null ? null : round(reached, 3),
      };
    }),
    bathRecord,
    photos: row.photoImageIds
      .filter((p) => kept.has(p))
      .map((p) => ({
        id: p,
        thumbUrl: `/api/studios/${studio.slug}/images/${p}/thumb`,
        webUrl: `/api/studios/${studio.slug}/images/${p}/web`,
      })),
  };
}

/** What the shelf holds of each stock line's dye at its strength, against what the skeins need. */
async function shelfChecks(
  db: Database,
  studioId: string,
  needs: Array<{
    dyeId: string | null;
    dyeName: string;
    stockStrengthPct: number;
    neededMl: number;
  }>,
): Promise<ShelfCheck[]> {
  const dyeIds = needs.map((n) => n.dyeId).filter((id) => id !== null);
  const jars = dyeIds.length
    ? await db
        .select()
        .from(stockSolutions)
        .where(and(eq(stockSolutions.studioId, studioId), inArray(stockSolutions.dyeId, dyeIds)))
    : [];
  return needs.map((need) => {
    const onShelfMl = jars
      .filter((j) => j.dyeId === need.dyeId && j.stockStrengthPct === need.stockStrengthPct)
      .reduce((sum, j) => sum + j.volumeLeftMl, 0);
    const short = stockShortfall({
      neededMl: need.neededMl,
      onShelfMl,
      stockStrengthPct: need.stockStrengthPct,
    });
    return {
      dyeName: need.dyeName,
      stockStrengthPct: need.stockStrengthPct,
      neededMl: round(need.neededMl, 1),
      onShelfMl: round(onShelfMl, 1),
      status: short.status,
      mixMl: round(short.mixMl, 1),
      mixDyePowderG: round(short.mixDyePowderG, 3),
    };
  });
}

/**
 * Dye an archived colorway again: N skeins of a base, from the amounts that actually went into
 * the pot, split into batches by the pot's capacity, with the stock to mix first.
 */
export async function dyeAgain(
  db: Database,
  studio: { id: string },
  id: string,
  query: DyeAgainQuery,
  system: MeasureSystem,
): Promise<DyeAgain> {
  const { row, month } = await archivedOrThrow(db, studio.id, id);
  const s = row.snapshot;
  const [base] = await db
    .select()
    .from(bases)
    .where(and(eq(bases.studioId, studio.id), eq(bases.id, query.baseId)));
  if (!base) throw notFound('That base');
  const potId = query.potId ?? s.potId;
  const [pot] = potId
    ? await db
        .select()
        .from(pots)
        .where(and(eq(pots.studioId, studio.id), eq(pots.id, potId)))
    : [];
  if (query.potId && !pot) throw notFound('That pot');

  const fiberG = fiberDyedG(row);
  const planned = toDyeKitRecipe(s, s.recipeLines);
  const rebuilt = withDyeKit('', () =>
    recipeFromLog(
      {
        planned,
        loggedAmounts: s.lines.map((l) => l.loggedAmount),
        fiberWeightDyedG: fiberG,
        bathVolumeMl: row.bathVolumeMl,
      },
      base.skeinWeightG,
    ),
  );
  const scaled = withDyeKit('', () =>
    scaleRecipe(rebuilt.recipe, {
      skeins: query.skeins,
      system,
      ...(pot ? { potCapacityMl: pot.capacityMl } : {}),
    }),
  );
  const lines = rebuilt.recipe.lines.map((line, i) => ({
    kind: line.kind,
    name: line.kind === 'stock' ? line.dyeName : line.colorName,
    unit: scaled.lines[i]!.unit,
    from: rebuilt.lines[i]!.from,
    depthOfShadePct:
      rebuilt.lines[i]!.depthOfShadePct === null
        ? null
        : round(rebuilt.lines[i]!.depthOfShadePct!, 3),
    amountPer100g:
      rebuilt.lines[i]!.amountPer100g === null ? null : round(rebuilt.lines[i]!.amountPer100g!, 3),
    stockStrengthPct: line.kind === 'stock' ? line.stockStrengthPct : null,
    totalAmount: round(scaled.lines[i]!.amount),
  }));
  const shelf = await shelfChecks(
    db,
    studio.id,
    rebuilt.recipe.lines.flatMap((line, i) =>
      line.kind === 'stock'
        ? [
            {
              dyeId: s.lines[i]?.dyeId ?? null,
              dyeName: line.dyeName,
              stockStrengthPct: line.stockStrengthPct,
              neededMl: scaled.lines[i]!.amount,
            },
          ]
        : [],
    ),
  );
  return {
    archivedColorwayId: row.id,
    colorwayName: s.colorwayName,
    dyeAlongTitle: month.title,
    monthLabel: monthLabelOf(month),
    swatches: s.targetSwatches,
    base: { id: base.id, name: base.name, skeinWeightG: base.skeinWeightG, lot: base.lot },
    skeins: query.skeins,
    pot: pot ? { name: pot.name, capacityMl: pot.capacityMl } : null,
    fiberWeightDyedG: fiberG,
    liquorRatio: round(rebuilt.recipe.liquorRatio, 1),
    system,
    lines,
    batches: scaled.batches,
    shelf,
    warnings: scaled.warnings,
    bathRecord: {
      temperatureReachedC: row.temperatureReachedC,
      timeAtTemperatureMin: row.timeAtTemperatureMin,
      bathExhausted: row.bathExhausted,
    },
    safetyNote: DYE_SAFETY_NOTE,
  };
}
