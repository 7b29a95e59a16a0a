import { TZDate } from '@date-fns/tz';
import { addDays, format, nextSaturday } from 'date-fns';
import { and, eq } from '@vatside/db/sql';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import { baseCreateSchema, potCreateSchema } from '@vatside/contracts/workbench-bases';
import {
  colorwayCreateSchema,
  stepCreateSchema,
  type RecipeLineInput,
} from '@vatside/contracts/workbench-colorways';
import { dyeCreateSchema, stockSolutionCreateSchema } from '@vatside/contracts/workbench-shelf';
import type { Database } from '@vatside/db/client';
import {
  tidePoolBases,
  tidePoolColorways,
  tidePoolDyeAlong,
  tidePoolDyes,
  tidePoolPots,
  tidePoolStockStrengthPct,
  tidePoolStockVolumeMl,
  tidePoolStudioSlug,
  tidePoolSwatchNames,
} from '@vatside/db/demo-data';
import {
  bases,
  colorways,
  dyeAlongColorways,
  dyeAlongs,
  dyes,
  images,
  pots,
  stockSolutions,
  studioMembers,
  studios,
  type StoredSwatch,
} from '@vatside/db/schema';
import { createBase, createPot } from '../services/workbench-bases.ts';
import { createColorway } from '../services/workbench-colorways.ts';
import { createImage } from '../services/workbench-images.ts';
import { createDye, createStockSolution } from '../services/workbench-shelf.ts';
import { createStep } from '../services/workbench-steps.ts';
import { instantFromLocal } from '../services/zoned-time.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import { processImage } from '../uploads/process-image.ts';
import { tidePoolPng } from './tide-pool-image.ts';

// The invented "tide pool" month of Wrackline Dyehouse, written through the same services the
// routes use (so it passes the same checks) and found by name on a second run (idempotent).

export interface TidePoolSeedDeps {
  db: Database;
  objectStore: ObjectStore;
  maxPixels: number;
  now?: Date;
}

/** The first Saturday at least `days` after `now`, at the host's local time, as an instant. */
export function tidePoolStart(now: Date): Date {
  const { timeZone, localTime, daysAfterSeed } = tidePoolDyeAlong;
  const earliest = addDays(new TZDate(now.getTime(), timeZone), daysAfterSeed);
  const saturday = earliest.getDay() === 6 ? earliest : nextSaturday(earliest);
  return instantFromLocal(`${format(saturday, 'yyyy-MM-dd')}T${localTime}`, timeZone);
}

/** Names the palette's swatches after the nearest of the demo's named colors (CIEDE2000). */
function namedPalette(palette: StoredSwatch[]): StoredSwatch[] {
  const free = [...tidePoolSwatchNames];
  return palette.map((swatch) => {
    if (free.length === 0) return swatch;
    const distances = free.map((n) => deltaE2000(swatch.lab, hexToLab(n.hex)));
    const nearest = distances.indexOf(Math.min(...distances));
    const [name] = free.splice(nearest, 1);
    return { ...swatch, label: name!.label };
  });
}

export async function seedTidePool(deps: TidePoolSeedDeps): Promise<void> {
  const { db } = deps;
  const now = deps.now ?? new Date();
  const [studio] = await db.select().from(studios).where(eq(studios.slug, tidePoolStudioSlug));
  if (!studio)
    throw new Error(`The demo studio ${tidePoolStudioSlug} is missing; seed people first.`);
  const [host] = await db
    .select({ userId: studioMembers.userId })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.role, 'host')));
  if (!host) throw new Error('The demo studio has no host.');

  // The dye shelf: generic food colors, and acid-dye powders each mixed into a 1 % stock.
  const dyeIds = new Map<string, string>();
  const stockIds = new Map<string, string>();
  for (const dye of tidePoolDyes) {
    const [found] = await db
      .select()
      .from(dyes)
      .where(and(eq(dyes.studioId, studio.id), eq(dyes.name, dye.name)));
    const id = found?.id ?? (await createDye(db, studio.id, dyeCreateSchema.parse(dye))).id;
    dyeIds.set(dye.name, id);
    if (dye.kind !== 'acidDyePowder') continue;
    const [jar] = await db
      .select({ id: stockSolutions.id })
      .from(stockSolutions)
      .where(
        and(
          eq(stockSolutions.dyeId, id),
          eq(stockSolutions.stockStrengthPct, tidePoolStockStrengthPct),
        ),
      );
    const stockId =
      jar?.id ??
      (
        await createStockSolution(
          db,
          studio.id,
          stockSolutionCreateSchema.parse({
            dyeId: id,
            stockStrengthPct: tidePoolStockStrengthPct,
            volumeMadeMl: tidePoolStockVolumeMl,
            madeOn: format(addDays(now, -5), 'yyyy-MM-dd'),
          }),
        )
      ).id;
    stockIds.set(dye.name, stockId);
  }

  const baseIds = new Map<string, string>();
  for (const base of tidePoolBases) {
    const [found] = await db
      .select()
      .from(bases)
      .where(and(eq(bases.studioId, studio.id), eq(bases.name, base.name)));
    baseIds.set(
      base.name,
      found?.id ?? (await createBase(db, studio.id, baseCreateSchema.parse(base))).id,
    );
  }
  const potIds = new Map<string, string>();
  for (const pot of tidePoolPots) {
    const [found] = await db
      .select()
      .from(pots)
      .where(and(eq(pots.studioId, studio.id), eq(pots.name, pot.name)));
    potIds.set(
      pot.name,
      found?.id ?? (await createPot(db, studio.id, potCreateSchema.parse(pot))).id,
    );
  }

  // The dye-along comes last; if it exists, the month is there (only its date may be stale).
  const [existing] = await db
    .select()
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.studioId, studio.id), eq(dyeAlongs.title, tidePoolDyeAlong.title)));
  if (existing) {
    // A demo database kept for weeks: move a start that has passed three weeks on again.
    if (existing.status === 'announced' && existing.startsAt <= now) {
      const startsAt = tidePoolStart(now);
      await db
        .update(dyeAlongs)
        .set({
          startsAt,
          shareOpensAt: startsAt,
          shareClosesAt: addDays(startsAt, tidePoolDyeAlong.shareDays),
        })
        .where(eq(dyeAlongs.id, existing.id));
    }
    return;
  }

  // The inspiration image goes through the real upload pipeline: renditions and a palette.
  const processed = await processImage(await tidePoolPng(), {
    maxPixels: deps.maxPixels,
    swatchCount: 6,
  });
  const image = await createImage(db, deps.objectStore, studio, {
    purpose: 'inspiration',
    colorwayId: undefined,
    uploadedBy: host.userId,
    processed: { ...processed, palette: namedPalette(processed.palette) },
  });
  const [imageRow] = await db.select().from(images).where(eq(images.id, image.id));
  const swatchByLabel = new Map((imageRow?.palette ?? []).map((s) => [s.label, s.hex]));

  const colorwayIds: string[] = [];
  for (const plan of tidePoolColorways) {
    const [found] = await db
      .select()
      .from(colorways)
      .where(and(eq(colorways.studioId, studio.id), eq(colorways.name, plan.name)));
    if (found) {
      colorwayIds.push(found.id);
      continue;
    }
    const recipeLines: RecipeLineInput[] = plan.lines.map((line) =>
      line.kind === 'stock'
        ? {
            kind: 'stock',
            stockSolutionId: stockIds.get(line.dye)!,
            depthOfShadePct: line.depthOfShadePct,
          }
        : {
            kind: 'foodColor',
            dyeId: dyeIds.get(line.dye)!,
            amountPer100g: line.amountPer100g,
            unit: line.unit,
          },
    );
    const colorway = await createColorway(
      db,
      studio.id,
      colorwayCreateSchema.parse({
        name: plan.name,
        technique: plan.technique,
        baseId: baseIds.get(plan.base)!,
        potId: potIds.get(plan.pot)!,
        skeinCount: plan.skeinCount,
        liquorRatio: plan.liquorRatio,
        acid: plan.acid,
        recipeLines,
        targetSwatches: plan.swatches.map((label) => ({
          hex: swatchByLabel.get(label) ?? tidePoolSwatchNames.find((n) => n.label === label)!.hex,
          name: label,
        })),
        notes: plan.notes,
      }),
    );
    for (const step of plan.steps) {
      const { line, ...rest } = step;
      await createStep(
        db,
        studio.id,
        colorway.id,
        stepCreateSchema.parse({
          ...rest,
          ...(line !== undefined ? { recipeLineId: colorway.recipeLines[line]!.id } : {}),
        }),
      );
    }
    colorwayIds.push(colorway.id);
  }

  // Announced directly, without the transition: the demo must not e-mail its followers.
  const startsAt = tidePoolStart(now);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(dyeAlongs)
      .values({
        studioId: studio.id,
        title: tidePoolDyeAlong.title,
        description: tidePoolDyeAlong.description,
        startsAt,
        timeZone: tidePoolDyeAlong.timeZone,
        expectedLengthMin: tidePoolDyeAlong.expectedLengthMin,
        streamUrl: tidePoolDyeAlong.streamUrl,
        inspirationImageId: image.id,
        shareOpensAt: startsAt,
        shareClosesAt: addDays(startsAt, tidePoolDyeAlong.shareDays),
        hostPrepItems: tidePoolDyeAlong.hostPrepItems.map((item, i) => ({
          id: `00000000-0000-4000-8000-${String(i + 1).padStart(12, '0')}`,
          ...item,
        })),
        status: 'announced',
        statusChangedAt: now,
        announcedAt: now,
        createdBy: host.userId,
      })
      .returning({ id: dyeAlongs.id });
    await tx
      .insert(dyeAlongColorways)
      .values(
        colorwayIds.map((colorwayId, i) => ({ dyeAlongId: row!.id, colorwayId, position: i + 1 })),
      );
  });
}
