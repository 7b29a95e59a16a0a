import { and, asc, eq, inArray } from '@vatside/db/sql';
import type { MeasureSystem } from '@vatside/dye-kit';
import type { PrepChecklist, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import type { Database } from '@vatside/db/client';
import {
  bases,
  colorways,
  dyeAlongColorways,
  dyes,
  images,
  pots,
  runSheetSteps,
  stockSolutions,
} from '@vatside/db/schema';
import { prepChecklist } from './dye-along-prep.ts';
import { supplyList, type SupplyColorway, type SupplyTarget } from './dye-along-supplies.ts';
import type { DyeAlongRow } from './dye-alongs.ts';
import { zonedTime } from './zoned-time.ts';

// What a dye-along looks like from outside: its colorways loaded for the supply list, the prep
// checklist, and the public page.

/** The month's colorways with their base, pot and run sheet, in the order they are dyed. */
export async function supplyColorways(
  db: Database,
  dyeAlongId: string,
): Promise<{ colorways: SupplyColorway[]; liquidStockIds: Set<string> }> {
  const rows = await db
    .select({ colorway: colorways })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId))
    .orderBy(asc(dyeAlongColorways.position));
  const list = rows.map((r) => r.colorway);
  const ids = list.map((c) => c.id);
  const baseIds = list.flatMap((c) => (c.baseId ? [c.baseId] : []));
  const potIds = list.flatMap((c) => (c.potId ? [c.potId] : []));
  const stockIds = list.flatMap((c) =>
    c.recipeLines.flatMap((l) =>
      l.kind === 'stock' && l.stockSolutionId ? [l.stockSolutionId] : [],
    ),
  );
  const [baseRows, potRows, stepRows, liquidStocks] = await Promise.all([
    baseIds.length ? db.select().from(bases).where(inArray(bases.id, baseIds)) : [],
    potIds.length ? db.select().from(pots).where(inArray(pots.id, potIds)) : [],
    ids.length
      ? db
          .select()
          .from(runSheetSteps)
          .where(inArray(runSheetSteps.colorwayId, ids))
          .orderBy(asc(runSheetSteps.position))
      : [],
    stockIds.length
      ? db
          .select({ id: stockSolutions.id })
          .from(stockSolutions)
          .innerJoin(dyes, eq(dyes.id, stockSolutions.dyeId))
          .where(
            and(
              inArray(stockSolutions.id, stockIds),
              inArray(dyes.kind, ['liquidFoodColor', 'gelFoodColor']),
            ),
          )
      : [],
  ]);
  const baseById = new Map(baseRows.map((b) => [b.id, b]));
  const potById = new Map(potRows.map((p) => [p.id, p]));
  return {
    liquidStockIds: new Set(liquidStocks.map((s) => s.id)),
    colorways: list.map((c) => {
      const base = c.baseId ? baseById.get(c.baseId) : undefined;
      const pot = c.potId ? potById.get(c.potId) : undefined;
      return {
        id: c.id,
        name: c.name,
        technique: c.technique,
        skeinCount: c.skeinCount,
        weightOfGoodsG: c.weightOfGoodsG,
        liquorRatio: c.liquorRatio,
        acid: c.acid,
        recipeLines: c.recipeLines,
        targetSwatches: c.targetSwatches,
        base: base
          ? {
              id: base.id,
              name: base.name,
              fiberContent: base.fiberContent,
              superwash: base.superwash,
            }
          : null,
        pot: pot ? { name: pot.name, capacityMl: pot.capacityMl, material: pot.material } : null,
        steps: stepRows
          .filter((s) => s.colorwayId === c.id)
          .map((s) => ({
            instruction: s.instruction,
            timerSeconds: s.timerSeconds,
            temperatureC: s.temperatureC,
            caution: s.caution,
          })),
      };
    }),
  };
}

export async function dyeAlongSupplies(
  db: Database,
  row: DyeAlongRow,
  target: SupplyTarget,
  system: MeasureSystem,
): Promise<{ supplyList: SupplyList; prepChecklist: PrepChecklist }> {
  const { colorways: list, liquidStockIds } = await supplyColorways(db, row.id);
  const supplies = supplyList(list, target, { system, liquidStockIds });
  return { supplyList: supplies, prepChecklist: prepChecklist(list, supplies, row.hostPrepItems) };
}

export const dyeAlongApiPath = (slug: string, id: string) =>
  `/api/studios/${slug}/dye-alongs/${id}`;

export interface ReaderChoices {
  weightOfGoodsG: number;
  system: MeasureSystem;
  timeZone: string;
}

/** The viewer's page: inspiration, palette, supplies for their skein, prep, start on their clock. */
export async function publicDyeAlong(
  db: Database,
  studio: { slug: string; name: string },
  row: DyeAlongRow,
  reader: ReaderChoices,
): Promise<PublicDyeAlong> {
  const api = dyeAlongApiPath(studio.slug, row.id);
  const [image] = row.inspirationImageId
    ? await db.select().from(images).where(eq(images.id, row.inspirationImageId))
    : [];
  const { supplyList: supplies, prepChecklist: prep } = await dyeAlongSupplies(
    db,
    row,
    { scope: 'perSkein', weightOfGoodsG: reader.weightOfGoodsG },
    reader.system,
  );
  return {
    id: row.id,
    studio,
    title: row.title,
    description: row.description,
    status: row.status,
    startsAt: row.startsAt.toISOString(),
    endsAt: new Date(row.startsAt.getTime() + row.expectedLengthMin * 60_000).toISOString(),
    hostTimeZone: row.timeZone,
    startsAtHost: zonedTime(row.startsAt, row.timeZone),
    startsAtLocal: zonedTime(row.startsAt, reader.timeZone),
    expectedLengthMin: row.expectedLengthMin,
    streamUrl: row.streamUrl,
    inspiration: image
      ? {
          webUrl: `${api}/inspiration/web`,
          thumbUrl: `${api}/inspiration/thumb`,
          width: image.width,
          height: image.height,
          palette: image.palette,
        }
      : null,
    shareOpensAt: row.shareOpensAt?.toISOString() ?? null,
    shareClosesAt: row.shareClosesAt?.toISOString() ?? null,
    supplyList: supplies,
    prepChecklist: prep,
    cautions: supplies.cautions,
    calendarUrl: `${api}/calendar.ics`,
  };
}
