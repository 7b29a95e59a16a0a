import { sql } from 'drizzle-orm';
import {
  boolean,
  check,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { createdAt, updatedAt } from './columns.ts';
import { user } from './auth-schema.ts';
import { studios } from './schema.ts';

// The host's workbench: the dye shelf, bases, pots, colorways with recipes and run sheets, and
// images with their palettes. Every row belongs to one studio; the server checks the role.

const studioId = () =>
  uuid('studio_id')
    .notNull()
    .references(() => studios.id, { onDelete: 'cascade' });

export const dyeKind = pgEnum('dye_kind', [
  'liquidFoodColor',
  'gelFoodColor',
  'acidDyePowder',
  'other',
]);

/** A dye on the studio's shelf; `colorantIds` are dye-kit's COLORANTS ids (FD&C / E-number). */
export const dyes = pgTable(
  'dyes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    kind: dyeKind('kind').notNull(),
    name: varchar('name', { length: 80 }).notNull(),
    colorantIds: text('colorant_ids')
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    swatchHex: varchar('swatch_hex', { length: 7 }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('dyes_studio_idx').on(t.studioId, t.name)],
);

/** A jar of dye dissolved at a known strength (% w/v: grams of dye per 100 mL). */
export const stockSolutions = pgTable(
  'stock_solutions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    // A dye with jars on the shelf cannot be deleted: the jars would lose their name.
    dyeId: uuid('dye_id')
      .notNull()
      .references(() => dyes.id, { onDelete: 'restrict' }),
    stockStrengthPct: doublePrecision('stock_strength_pct').notNull(),
    volumeMadeMl: doublePrecision('volume_made_ml').notNull(),
    madeOn: date('made_on', { mode: 'string' }).notNull(),
    volumeLeftMl: doublePrecision('volume_left_ml').notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('stock_solutions_studio_idx').on(t.studioId, t.madeOn),
    check('stock_strength_range', sql`${t.stockStrengthPct} > 0 and ${t.stockStrengthPct} <= 100`),
    check('stock_volume_left_range', sql`${t.volumeLeftMl} >= 0`),
  ],
);

/** Every hand correction of what is left in a jar, with the host's reason. */
export const stockAdjustments = pgTable(
  'stock_adjustments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    stockSolutionId: uuid('stock_solution_id')
      .notNull()
      .references(() => stockSolutions.id, { onDelete: 'cascade' }),
    volumeLeftBeforeMl: doublePrecision('volume_left_before_ml').notNull(),
    volumeLeftAfterMl: doublePrecision('volume_left_after_ml').notNull(),
    reason: varchar('reason', { length: 200 }).notNull(),
    adjustedBy: text('adjusted_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('stock_adjustments_stock_idx').on(t.stockSolutionId, t.createdAt)],
);

export interface FiberContentPart {
  fiber: string;
  pct: number;
}

/** A yarn base. Weight class: Craft Yarn Council Standard Yarn Weight System, 0 (lace)–7 (jumbo). */
export const bases = pgTable(
  'bases',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    name: varchar('name', { length: 80 }).notNull(),
    fiberContent: jsonb('fiber_content').$type<FiberContentPart[]>().notNull(),
    superwash: boolean('superwash').notNull(),
    weightClass: integer('weight_class').notNull(),
    skeinWeightG: doublePrecision('skein_weight_g').notNull(),
    skeinLengthM: doublePrecision('skein_length_m').notNull(),
    lot: varchar('lot', { length: 40 }).notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('bases_studio_idx').on(t.studioId, t.name),
    check('bases_weight_class_range', sql`${t.weightClass} between 0 and 7`),
  ],
);

export const potMaterial = pgEnum('pot_material', [
  'stainlessSteel',
  'enamel',
  'aluminum',
  'other',
]);

export const pots = pgTable(
  'pots',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    name: varchar('name', { length: 80 }).notNull(),
    capacityMl: doublePrecision('capacity_ml').notNull(),
    material: potMaterial('material').notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('pots_studio_idx').on(t.studioId, t.name)],
);

export const technique = pgEnum('colorway_technique', [
  'immersion',
  'dipGradient',
  'speckle',
  'layeredPour',
  'leftovers',
]);

export interface TargetSwatch {
  hex: string;
  name: string;
}

/** dye-kit's RecipeLine plus a stable id (run-sheet steps point at it) and shelf links. */
export type StoredRecipeLine =
  | {
      id: string;
      kind: 'stock';
      stockSolutionId: string | null;
      dyeName: string;
      stockStrengthPct: number;
      depthOfShadePct: number;
    }
  | {
      id: string;
      kind: 'foodColor';
      dyeId: string | null;
      colorName: string;
      amountPer100g: number;
      unit: 'mL' | 'drop' | 'gGel';
      dropsPerMl?: number;
      colorants?: string[];
    };

export type StoredAcid =
  | { acid: 'vinegar'; acidStrengthPct: number; amountMl?: number }
  | { acid: 'citric'; amountMl?: number };

/** A colorway: the recipe as the host wrote it for their own skein, and what it aims at. */
export const colorways = pgTable(
  'colorways',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    name: varchar('name', { length: 80 }).notNull(),
    technique: technique('technique').notNull(),
    baseId: uuid('base_id').references(() => bases.id, { onDelete: 'set null' }),
    potId: uuid('pot_id').references(() => pots.id, { onDelete: 'set null' }),
    skeinCount: integer('skein_count').notNull().default(1),
    /** Dry weight of one of the host's skeins, g: the weight the recipe is written for. */
    weightOfGoodsG: doublePrecision('weight_of_goods_g').notNull(),
    liquorRatio: doublePrecision('liquor_ratio').notNull(),
    acid: jsonb('acid').$type<StoredAcid>().notNull(),
    recipeLines: jsonb('recipe_lines').$type<StoredRecipeLine[]>().notNull(),
    targetSwatches: jsonb('target_swatches').$type<TargetSwatch[]>().notNull(),
    notes: text('notes').notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('colorways_studio_idx').on(t.studioId, t.updatedAt)],
);

export const cautionKind = pgEnum('caution_kind', ['hotBath', 'acid', 'powder', 'none']);

/** One step of a colorway's run sheet, in `position` order. */
export const runSheetSteps = pgTable(
  'run_sheet_steps',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    colorwayId: uuid('colorway_id')
      .notNull()
      .references(() => colorways.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    instruction: text('instruction').notNull(),
    /** A recipe line's id in the colorway; null when the step measures nothing. */
    recipeLineId: uuid('recipe_line_id'),
    timerSeconds: integer('timer_seconds'),
    temperatureC: doublePrecision('temperature_c'),
    /** What the bath looks like at that temperature, for people without a thermometer. */
    visualCue: text('visual_cue'),
    caution: cautionKind('caution').notNull().default('none'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('run_sheet_steps_colorway_idx').on(t.colorwayId, t.position)],
);

export const imagePurpose = pgEnum('image_purpose', ['inspiration', 'colorwayPhoto']);

export interface StoredSwatch {
  id: string;
  hex: string;
  lab: { l: number; a: number; b: number };
  /** Share of the image; null for a swatch the host picked from a point. */
  share: number | null;
  /** dye-kit's readable name (ISCC–NBS approximation). */
  name: string;
  /** The host's own name for it; empty until renamed. */
  label: string;
}

/** An image that went through the upload pipeline: only our re-encoded renditions are stored. */
export const images = pgTable(
  'images',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: studioId(),
    purpose: imagePurpose('purpose').notNull(),
    colorwayId: uuid('colorway_id').references(() => colorways.id, { onDelete: 'set null' }),
    webKey: text('web_key').notNull().unique(),
    thumbKey: text('thumb_key').notNull().unique(),
    contentType: varchar('content_type', { length: 40 }).notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    bytes: integer('bytes').notNull(),
    thumbWidth: integer('thumb_width').notNull(),
    thumbHeight: integer('thumb_height').notNull(),
    palette: jsonb('palette').$type<StoredSwatch[]>().notNull(),
    uploadedBy: text('uploaded_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('images_studio_idx').on(t.studioId, t.createdAt)],
);
