import { randomUUID } from 'node:crypto';
import { TZDate } from '@date-fns/tz';
import { addMinutes, format, previousSaturday, subMonths } from 'date-fns';
import sharp from 'sharp';
import { colorwayCreateSchema, type RecipeLineInput } from '@vatside/contracts/workbench-colorways';
import type { LiveProgram, LiveProgramPot } from '@vatside/contracts/live-program';
import type { Database } from '@vatside/db/client';
import { tidePoolStockStrengthPct, tidePoolStudioSlug } from '@vatside/db/demo-data';
import {
  archivedColorways,
  bases,
  colorways,
  dyeAlongColorways,
  dyeAlongs,
  dyeLogEntries,
  dyes,
  liveSessions,
  pots,
  stockSolutions,
  studioMembers,
  studios,
  type StoredDyeLot,
} from '@vatside/db/schema';
import { and, eq } from '@vatside/db/sql';
import { bathAmounts } from '@vatside/dye-kit';
import { toDyeKitRecipe } from '@vatside/contracts/recipe';
import { initialState } from '../live/program.ts';
import { transitionDyeAlong } from '../services/dye-alongs.ts';
import { createColorway } from '../services/workbench-colorways.ts';
import { createImage } from '../services/workbench-images.ts';
import { instantFromLocal } from '../services/zoned-time.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import { processImage } from '../uploads/process-image.ts';

// An invented earlier month of Wrackline Dyehouse, already archived: three colorways, a dye log
// whose amounts differ a little from the plan, bath records and a photo of each skein, so the
// archive, its search and "dye again" have something to show. It uses the tide-pool month's
// shelf, bases and pots (seed those first) and is found by title on a second run.

const TITLE = 'Kelp Forest';
const TIME_ZONE = 'America/Halifax';

type PastLine =
  | { kind: 'stock'; dye: string; depthOfShadePct: number; loggedMl: number }
  | { kind: 'foodColor'; dye: string; amountPer100g: number; unit: 'mL' | 'gGel'; logged: number };

interface PastColorway {
  name: string;
  base: string;
  pot: string;
  skeinCount: number;
  liquorRatio: number;
  lines: PastLine[];
  swatches: Array<{ hex: string; name: string }>;
  notes: string;
  bath: {
    fiberWeightDyedG: number;
    bathVolumeMl: number;
    temperatureReachedC: number;
    timeAtTemperatureMin: number;
    bathExhausted: boolean;
    baseLot: string;
    dyeLots: StoredDyeLot[];
    notes: string;
  };
}

const pastColorways: PastColorway[] = [
  {
    name: 'Holdfast Amber',
    base: 'Headland DK',
    pot: 'Blue enamel pot',
    skeinCount: 2,
    liquorRatio: 25,
    lines: [
      { kind: 'stock', dye: 'Rustfall Orange', depthOfShadePct: 1.2, loggedMl: 252 },
      { kind: 'stock', dye: 'Kelpstrand Green', depthOfShadePct: 0.2, loggedMl: 38 },
    ],
    swatches: [
      { hex: '#a8642a', name: 'holdfast amber' },
      { hex: '#6b5a2e', name: 'stipe brown' },
    ],
    notes: 'The amber knot where kelp grips the rock. Non-superwash: no stirring once hot.',
    bath: {
      fiberWeightDyedG: 204,
      bathVolumeMl: 5_000,
      temperatureReachedC: 86,
      timeAtTemperatureMin: 25,
      bathExhausted: true,
      baseLot: 'HD-2608',
      dyeLots: [
        { dyeName: 'Rustfall Orange', lot: 'RO-0519' },
        { dyeName: 'Kelpstrand Green', lot: 'KG-0602' },
      ],
      notes: 'A splash more orange than planned; the water cleared after 25 minutes.',
    },
  },
  {
    name: 'Understory Green',
    base: 'Wrackline Sock',
    pot: 'Big stainless stockpot',
    skeinCount: 3,
    liquorRatio: 30,
    lines: [
      { kind: 'stock', dye: 'Kelpstrand Green', depthOfShadePct: 1, loggedMl: 288 },
      { kind: 'stock', dye: 'Brinewell Blue', depthOfShadePct: 0.25, loggedMl: 80 },
    ],
    swatches: [
      { hex: '#2f5d3a', name: 'understory green' },
      { hex: '#1d4a4f', name: 'deep channel' },
    ],
    notes: 'Shade under the canopy. Blue goes in last and needs the full hold.',
    bath: {
      fiberWeightDyedG: 300,
      bathVolumeMl: 9_000,
      temperatureReachedC: 88,
      timeAtTemperatureMin: 30,
      bathExhausted: false,
      baseLot: 'WS-2607',
      dyeLots: [
        { dyeName: 'Kelpstrand Green', lot: 'KG-0602' },
        { dyeName: 'Brinewell Blue', lot: 'BB-0415' },
      ],
      notes: 'A faint blue tint stayed in the water; a longer hold might take it up.',
    },
  },
  {
    name: 'Sea Glass',
    base: 'Wrackline Sock',
    pot: 'Blue enamel pot',
    skeinCount: 1,
    liquorRatio: 30,
    lines: [
      {
        kind: 'foodColor',
        dye: 'liquid food color — teal',
        amountPer100g: 4,
        unit: 'mL',
        logged: 4.5,
      },
      {
        kind: 'foodColor',
        dye: 'gel food color — sea green',
        amountPer100g: 0.3,
        unit: 'gGel',
        logged: 0.3,
      },
    ],
    swatches: [{ hex: '#8cc7b5', name: 'sea glass' }],
    notes: 'A pale, frosted green-teal, dyed with food color.',
    bath: {
      fiberWeightDyedG: 100,
      bathVolumeMl: 3_000,
      temperatureReachedC: 85,
      timeAtTemperatureMin: 15,
      bathExhausted: true,
      baseLot: 'WS-2607',
      dyeLots: [],
      notes: 'Half a mL more teal than planned to lift the green.',
    },
  },
];

/** A flat photo of a finished skein in its colors, drawn in code. */
function skeinPng(colors: string[]): Promise<Buffer> {
  const bands = Array.from({ length: 14 }, (_, i) => {
    const color = colors[i % colors.length]!;
    const y = 170 + i * 18;
    return `<ellipse cx="400" cy="${y}" rx="300" ry="34" fill="none" stroke="${color}" stroke-width="22"/>`;
  }).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600"><rect width="800" height="600" fill="#e9e2d4"/>${bands}</svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}

/** A Saturday about two months before `now`, 2 PM on the host's clock. */
export function pastMonthStart(now: Date): Date {
  const day = previousSaturday(subMonths(new TZDate(now.getTime(), TIME_ZONE), 2));
  return instantFromLocal(`${format(day, 'yyyy-MM-dd')}T14:00`, TIME_ZONE);
}

export interface PastMonthSeedDeps {
  db: Database;
  objectStore: ObjectStore;
  maxPixels: number;
  now?: Date;
}

export async function seedPastMonth(deps: PastMonthSeedDeps): Promise<void> {
  const { db } = deps;
  const now = deps.now ?? new Date();
  const [studio] = await db.select().from(studios).where(eq(studios.slug, tidePoolStudioSlug));
  if (!studio) throw new Error(`The demo studio ${tidePoolStudioSlug} is missing.`);
  const [existing] = await db
    .select()
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.studioId, studio.id), eq(dyeAlongs.title, TITLE)));
  if (existing) {
    // A run stopped between writing the month and archiving it finishes the job.
    if (existing.status === 'recap')
      await transitionDyeAlong(db, studio.id, existing.id, 'archived', now);
    return;
  }
  const [host] = await db
    .select({ userId: studioMembers.userId })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.role, 'host')));
  if (!host) throw new Error('The demo studio has no host.');

  const byName = async <T extends { name: string }>(rows: Promise<T[]>, name: string) => {
    const found = (await rows).find((r) => r.name === name);
    if (!found) throw new Error(`The past month needs "${name}" from the tide-pool seed.`);
    return found;
  };
  const studioDyes = db.select().from(dyes).where(eq(dyes.studioId, studio.id));
  const studioBases = db.select().from(bases).where(eq(bases.studioId, studio.id));
  const studioPots = db.select().from(pots).where(eq(pots.studioId, studio.id));
  const jarOf = async (dyeId: string) => {
    const [jar] = await db
      .select()
      .from(stockSolutions)
      .where(
        and(
          eq(stockSolutions.dyeId, dyeId),
          eq(stockSolutions.stockStrengthPct, tidePoolStockStrengthPct),
        ),
      );
    if (!jar) throw new Error('The past month needs the tide-pool seed’s stock jars.');
    return jar;
  };

  const made: Array<{
    row: typeof colorways.$inferSelect;
    plan: PastColorway;
    jars: (string | null)[];
  }> = [];
  for (const plan of pastColorways) {
    const jars: (string | null)[] = [];
    const recipeLines: RecipeLineInput[] = [];
    for (const line of plan.lines) {
      const dye = await byName(studioDyes, line.dye);
      if (line.kind === 'stock') {
        const jar = await jarOf(dye.id);
        jars.push(jar.id);
        recipeLines.push({
          kind: 'stock',
          stockSolutionId: jar.id,
          depthOfShadePct: line.depthOfShadePct,
        });
      } else {
        jars.push(null);
        recipeLines.push({
          kind: 'foodColor',
          dyeId: dye.id,
          amountPer100g: line.amountPer100g,
          unit: line.unit,
        });
      }
    }
    const [found] = await db
      .select()
      .from(colorways)
      .where(and(eq(colorways.studioId, studio.id), eq(colorways.name, plan.name)));
    const created =
      found ??
      (await createColorway(
        db,
        studio.id,
        colorwayCreateSchema.parse({
          name: plan.name,
          technique: 'immersion',
          baseId: (await byName(studioBases, plan.base)).id,
          potId: (await byName(studioPots, plan.pot)).id,
          skeinCount: plan.skeinCount,
          liquorRatio: plan.liquorRatio,
          recipeLines,
          targetSwatches: plan.swatches,
          notes: plan.notes,
        }),
      ));
    const [row] = await db.select().from(colorways).where(eq(colorways.id, created.id));
    made.push({ row: row!, plan, jars });
  }

  // A photo of each finished skein, through the real image pipeline.
  const photoIds = new Map<string, string>();
  for (const { row, plan } of made) {
    const processed = await processImage(await skeinPng(plan.swatches.map((s) => s.hex)), {
      maxPixels: deps.maxPixels,
      swatchCount: 3,
    });
    const image = await createImage(db, deps.objectStore, studio, {
      purpose: 'colorwayPhoto',
      colorwayId: row.id,
      uploadedBy: host.userId,
      processed,
    });
    photoIds.set(row.id, image.id);
  }

  const startsAt = pastMonthStart(now);
  await db.transaction(async (tx) => {
    const [month] = await tx
      .insert(dyeAlongs)
      .values({
        studioId: studio.id,
        title: TITLE,
        description:
          'Under the kelp canopy: amber holdfasts, deep understory greens and a pale sea-glass skein in food color.',
        startsAt,
        timeZone: TIME_ZONE,
        expectedLengthMin: 120,
        shareOpensAt: startsAt,
        shareClosesAt: addMinutes(startsAt, 14 * 24 * 60),
        status: 'recap',
        statusChangedAt: addMinutes(startsAt, 15 * 24 * 60),
        announcedAt: addMinutes(startsAt, -21 * 24 * 60),
        createdBy: host.userId,
      })
      .returning({ id: dyeAlongs.id });
    const dyeAlongId = month!.id;
    await tx
      .insert(dyeAlongColorways)
      .values(made.map((m, i) => ({ dyeAlongId, colorwayId: m.row.id, position: i + 1 })));

    // The live session of that day, ended, and what went into each pot.
    const sessionId = randomUUID();
    // The run sheets of that day are not kept: the pots carry the recipes the log was kept against.
    const pots: LiveProgramPot[] = made.map(({ row }) => ({
      potId: row.id,
      colorwayName: row.name,
      swatches: row.targetSwatches.map(({ hex, name }) => ({ hex, name })),
      recipe: {
        weightOfGoodsG: row.weightOfGoodsG,
        liquorRatio: row.liquorRatio,
        acid: row.acid,
        lines: row.recipeLines as LiveProgramPot['recipe']['lines'],
      },
      steps: [],
    }));
    const program: LiveProgram = {
      sessionId,
      mode: 'live',
      dyeAlong: {
        id: dyeAlongId,
        title: TITLE,
        studioSlug: studio.slug,
        studioName: studio.name,
        streamUrl: null,
      },
      pots,
    };
    await tx.insert(liveSessions).values({
      id: sessionId,
      studioId: studio.id,
      dyeAlongId,
      mode: 'live',
      state: { ...initialState(sessionId, 'live', pots), status: 'ended' },
      program,
      startedBy: host.userId,
      startedAt: startsAt,
      endedAt: addMinutes(startsAt, 130),
    });
    let minute = 10;
    for (const { row, plan, jars } of made) {
      const planned = bathAmounts(
        toDyeKitRecipe(row, row.recipeLines),
        row.weightOfGoodsG * row.skeinCount,
      );
      await tx.insert(dyeLogEntries).values(
        plan.lines.map((line, i) => {
          const amount = line.kind === 'stock' ? line.loggedMl : line.logged;
          const plannedAmount = Number(planned.lines[i]!.amount.toFixed(2));
          return {
            sessionId,
            potId: row.id,
            recipeLineId: row.recipeLines[i]!.id,
            kind: line.kind,
            name: line.kind === 'stock' ? `${line.dye} ${tidePoolStockStrengthPct} %` : line.dye,
            amount,
            unit: line.kind === 'stock' ? ('mL' as const) : line.unit,
            plannedAmount,
            asPlanned: Math.abs(amount - plannedAmount) <= plannedAmount * 0.005,
            stockSolutionId: jars[i] ?? null,
            // Those jars were used up and remade since: the demo shelf keeps today's levels.
            jarChangeMl: 0,
            addedAt: addMinutes(startsAt, (minute += 7)),
            recordedBy: host.userId,
            recordedAt: addMinutes(startsAt, minute),
          };
        }),
      );
      await tx.insert(archivedColorways).values({
        studioId: studio.id,
        dyeAlongId,
        colorwayId: row.id,
        ...plan.bath,
        photoImageIds: [photoIds.get(row.id)!],
        recordedBy: host.userId,
      });
    }
  });
  const [month] = await db
    .select({ id: dyeAlongs.id })
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.studioId, studio.id), eq(dyeAlongs.title, TITLE)));
  await transitionDyeAlong(db, studio.id, month!.id, 'archived', now);
}
