import { sql } from 'drizzle-orm';
import {
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { createdAt, updatedAt } from './columns.ts';
import { user } from './auth-schema.ts';
import { dyeAlongs } from './dye-along-schema.ts';
import { studios } from './schema.ts';
import {
  colorways,
  type FiberContentPart,
  type StoredAcid,
  type StoredRecipeLine,
  type TargetSwatch,
} from './workbench-schema.ts';

// The archive: for every colorway a month dyed, the bath record the host fills in after the live
// session, and (once the month is archived) a snapshot of the plan and of the dye log, so later
// edits on the workbench never rewrite what happened.

export interface StoredDyeLot {
  dyeName: string;
  lot: string;
}

/** One recipe line as planned, beside what the dye log says went into the pot. */
export interface StoredArchiveLine {
  recipeLineId: string;
  kind: 'stock' | 'foodColor';
  name: string;
  unit: 'mL' | 'drop' | 'gGel';
  /** The shelf dye behind the line (a jar's dye for stock lines), when known. */
  dyeId: string | null;
  /** Amount for the host's skeins (one skein's weight × skeins), in `unit`. */
  plannedAmount: number;
  /** Sum of the dye log's entries in force; null when nothing was logged for the line. */
  loggedAmount: number | null;
}

/** The colorway as it was when its month was archived. */
export interface StoredArchiveSnapshot {
  colorwayName: string;
  technique: string;
  baseId: string | null;
  baseName: string | null;
  baseFiberContent: FiberContentPart[] | null;
  potId: string | null;
  potName: string | null;
  potCapacityMl: number | null;
  /** Dry weight of one of the host's skeins, g, and how many the plan dyed. */
  weightOfGoodsG: number;
  skeinCount: number;
  liquorRatio: number;
  acid: StoredAcid;
  recipeLines: StoredRecipeLine[];
  targetSwatches: TargetSwatch[];
  colorwayNotes: string;
  lines: StoredArchiveLine[];
}

/** One row per colorway per month: the host's bath record, then the frozen snapshot. */
export const archivedColorways = pgTable(
  'archived_colorways',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    // The workbench colorway may go later; the snapshot keeps its record.
    colorwayId: uuid('colorway_id').references(() => colorways.id, { onDelete: 'set null' }),
    /** Dry weight of all the fiber in the pot that day, g (the plan's when left empty). */
    fiberWeightDyedG: doublePrecision('fiber_weight_dyed_g'),
    bathVolumeMl: doublePrecision('bath_volume_ml'),
    temperatureReachedC: doublePrecision('temperature_reached_c'),
    timeAtTemperatureMin: integer('time_at_temperature_min'),
    /** Did the water clear (the dye exhausted)? Null until the host says. */
    bathExhausted: boolean('bath_exhausted'),
    baseLot: varchar('base_lot', { length: 40 }).notNull().default(''),
    dyeLots: jsonb('dye_lots').$type<StoredDyeLot[]>().notNull().default([]),
    /** Workbench images of the finished skeins (colorway photos), in the host's order. */
    photoImageIds: uuid('photo_image_ids')
      .array()
      .notNull()
      .default(sql`'{}'::uuid[]`),
    notes: text('notes').notNull().default(''),
    recordedBy: text('recorded_by').references(() => user.id, { onDelete: 'set null' }),
    /** Set with `snapshot` when the month is archived. */
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    snapshot: jsonb('snapshot').$type<StoredArchiveSnapshot>(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('archived_colorways_month_colorway_idx').on(t.dyeAlongId, t.colorwayId),
    index('archived_colorways_studio_idx').on(t.studioId, t.archivedAt),
    check(
      'archived_colorways_snapshot_with_date',
      sql`(${t.archivedAt} is null) = (${t.snapshot} is null)`,
    ),
    check(
      'archived_colorways_bath_ranges',
      sql`(${t.bathVolumeMl} is null or ${t.bathVolumeMl} > 0) and (${t.fiberWeightDyedG} is null or ${t.fiberWeightDyedG} > 0) and (${t.timeAtTemperatureMin} is null or ${t.timeAtTemperatureMin} >= 0)`,
    ),
  ],
);
