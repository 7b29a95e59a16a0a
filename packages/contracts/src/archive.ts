import { z } from 'zod';
import type { Batch } from '@vatside/dye-kit';
import {
  hexColorSchema,
  idSchema,
  pageOf,
  pageQuerySchema,
  warningSchema,
} from './workbench-common.ts';
import { measureSystemSchema, recipeAcidSchema, techniqueSchema } from './workbench-colorways.ts';

// The archive: every colorway a month dyed, with its bath record (filled in by the host after the
// live session), the plan and the dye log frozen when the month is archived, and "dye again".

const dyeLotSchema = z.object({
  dyeName: z.string().trim().min(1).max(80),
  lot: z.string().trim().min(1).max(40),
});

/** PUT /api/studios/:slug/dye-alongs/:dyeAlongId/bath-records/:colorwayId (the whole record). */
export const bathRecordInputSchema = z.object({
  /** Dry weight of all the fiber in the pot that day, g; null: the plan's weight. */
  fiberWeightDyedG: z.number().positive().max(100_000).nullable().default(null),
  bathVolumeMl: z.number().positive().max(200_000).nullable().default(null),
  temperatureReachedC: z.number().min(0).max(100).nullable().default(null),
  timeAtTemperatureMin: z.number().int().min(0).max(1_440).nullable().default(null),
  /** Did the water clear? null: not noted. */
  bathExhausted: z.boolean().nullable().default(null),
  baseLot: z.string().trim().max(40).default(''),
  dyeLots: z.array(dyeLotSchema).max(24).default([]),
  /** Workbench images (colorway photos) of the finished skeins. */
  photoImageIds: z
    .array(idSchema)
    .max(12)
    .refine((ids) => new Set(ids).size === ids.length, 'List each photo once.')
    .default([]),
  notes: z.string().trim().max(5_000).default(''),
});
export type BathRecordInput = z.input<typeof bathRecordInputSchema>;

export const bathRecordSchema = z.object({
  colorwayId: idSchema,
  colorwayName: z.string(),
  /** The plan's dry weight for the day: one skein × skeins, g. */
  plannedFiberWeightG: z.number(),
  plannedBathVolumeMl: z.number(),
  fiberWeightDyedG: z.number().nullable(),
  bathVolumeMl: z.number().nullable(),
  temperatureReachedC: z.number().nullable(),
  timeAtTemperatureMin: z.number().int().nullable(),
  bathExhausted: z.boolean().nullable(),
  baseLot: z.string(),
  dyeLots: z.array(z.object({ dyeName: z.string(), lot: z.string() })),
  photoImageIds: z.array(idSchema),
  notes: z.string(),
  /** The archived colorway's id once the month is archived; null before. */
  archivedColorwayId: idSchema.nullable(),
  updatedAt: z.string().nullable(),
});
export type BathRecord = z.infer<typeof bathRecordSchema>;

/** GET .../dye-alongs/:dyeAlongId/bath-records: one per colorway of the month, in dye order. */
export const bathRecordListSchema = z.object({
  dyeAlongId: idSchema,
  /** The host may write them once the month has gone live. */
  editable: z.boolean(),
  records: z.array(bathRecordSchema),
});
export type BathRecordList = z.infer<typeof bathRecordListSchema>;

/** GET /api/studios/:slug/archive: by month, nearest to a color, by base, by dye. */
export const archiveSearchQuerySchema = pageQuerySchema.extend({
  month: z
    .string()
    .regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'Use a month like 2026-12.')
    .optional(),
  /** Nearest first by CIEDE2000 to any of a colorway's swatches. */
  hex: hexColorSchema.optional(),
  baseId: idSchema.optional(),
  dyeId: idSchema.optional(),
});
export type ArchiveSearchQuery = z.input<typeof archiveSearchQuerySchema>;

const swatchSchema = z.object({ hex: z.string(), name: z.string() });

export const archivedColorwaySummarySchema = z.object({
  id: idSchema,
  colorwayName: z.string(),
  technique: techniqueSchema,
  dyeAlongId: idSchema,
  dyeAlongTitle: z.string(),
  /** The month it was dyed, on the host's calendar: "2026-10". */
  month: z.string(),
  monthLabel: z.string(),
  baseName: z.string().nullable(),
  dyeNames: z.array(z.string()),
  swatches: z.array(swatchSchema),
  /** CIEDE2000 to the searched color from the nearest swatch; null without a color search. */
  deltaE2000: z.number().nullable(),
  archivedAt: z.string(),
});
export type ArchivedColorwaySummary = z.infer<typeof archivedColorwaySummarySchema>;
export const archiveListSchema = pageOf(archivedColorwaySummarySchema);
export type ArchiveList = z.infer<typeof archiveListSchema>;

export const archivedLineSchema = z.object({
  recipeLineId: idSchema,
  kind: z.enum(['stock', 'foodColor']),
  name: z.string(),
  unit: z.enum(['mL', 'drop', 'gGel']),
  plannedAmount: z.number(),
  /** null: nothing was logged for this line. */
  actualAmount: z.number().nullable(),
  /** Actual minus planned, % of planned. */
  differencePct: z.number().nullable(),
  /** Depth of shade (% on weight of fiber) planned and reached; stock lines only. */
  plannedDepthOfShadePct: z.number().nullable(),
  actualDepthOfShadePct: z.number().nullable(),
});
export type ArchivedLine = z.infer<typeof archivedLineSchema>;

/** GET /api/studios/:slug/archive/:archivedColorwayId */
export const archivedColorwayDetailSchema = archivedColorwaySummarySchema.extend({
  baseId: idSchema.nullable(),
  potName: z.string().nullable(),
  weightOfGoodsG: z.number(),
  skeinCount: z.number().int(),
  liquorRatio: z.number(),
  acid: recipeAcidSchema,
  colorwayNotes: z.string(),
  lines: z.array(archivedLineSchema),
  bathRecord: bathRecordSchema.omit({ archivedColorwayId: true }),
  /** Photos that are still in the studio's images. */
  photos: z.array(z.object({ id: idSchema, thumbUrl: z.string(), webUrl: z.string() })),
});
export type ArchivedColorwayDetail = z.infer<typeof archivedColorwayDetailSchema>;

/** GET /api/studios/:slug/archive/:archivedColorwayId/dye-again */
export const dyeAgainQuerySchema = z.object({
  baseId: idSchema,
  skeins: z.coerce.number().int().min(1).max(100),
  /** The pot to dye in; the colorway's pot (if still on the workbench) when left out. */
  potId: idSchema.optional(),
  system: measureSystemSchema.optional(),
});
export type DyeAgainQuery = z.input<typeof dyeAgainQuerySchema>;

export const dyeAgainLineSchema = z.object({
  kind: z.enum(['stock', 'foodColor']),
  name: z.string(),
  unit: z.enum(['mL', 'drop', 'gGel']),
  /** What the recipe below rests on: the logged amount, or the plan where nothing was logged. */
  from: z.enum(['actual', 'planned']),
  /** Depth of shade from the actual amount (stock lines); food color per 100 g of dry fiber. */
  depthOfShadePct: z.number().nullable(),
  amountPer100g: z.number().nullable(),
  stockStrengthPct: z.number().nullable(),
  /** For all the skeins together, in `unit`. */
  totalAmount: z.number(),
});
export type DyeAgainLine = z.infer<typeof dyeAgainLineSchema>;

export const shelfCheckSchema = z.object({
  dyeName: z.string(),
  stockStrengthPct: z.number(),
  neededMl: z.number(),
  onShelfMl: z.number(),
  status: z.enum(['enough', 'short', 'missing']),
  /** What to mix before starting (short or missing only): stock volume and the powder in it. */
  mixMl: z.number(),
  mixDyePowderG: z.number(),
});
export type ShelfCheck = z.infer<typeof shelfCheckSchema>;

export const dyeAgainSchema = z.object({
  archivedColorwayId: idSchema,
  colorwayName: z.string(),
  dyeAlongTitle: z.string(),
  monthLabel: z.string(),
  swatches: z.array(swatchSchema),
  base: z.object({ id: idSchema, name: z.string(), skeinWeightG: z.number(), lot: z.string() }),
  skeins: z.number().int(),
  pot: z.object({ name: z.string(), capacityMl: z.number() }).nullable(),
  /** Dry fiber the actual amounts were measured against, g. */
  fiberWeightDyedG: z.number(),
  liquorRatio: z.number(),
  system: measureSystemSchema,
  lines: z.array(dyeAgainLineSchema),
  /** dye-kit's batches (each with its water, dye lines and acid). */
  batches: z.array(z.custom<Batch>()),
  shelf: z.array(shelfCheckSchema),
  warnings: z.array(warningSchema),
  bathRecord: z.object({
    temperatureReachedC: z.number().nullable(),
    timeAtTemperatureMin: z.number().nullable(),
    bathExhausted: z.boolean().nullable(),
  }),
  safetyNote: z.string(),
});
export type DyeAgain = z.infer<typeof dyeAgainSchema>;
