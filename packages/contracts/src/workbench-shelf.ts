import { z } from 'zod';
import { COLORANTS, type ColorantId } from '@vatside/dye-kit';
import {
  hexColorSchema,
  idSchema,
  nameSchema,
  pageOf,
  patchOf,
  timestampsSchema,
} from './workbench-common.ts';

// The dye shelf: dyes and the stock solutions mixed from them.

export const dyeKinds = ['liquidFoodColor', 'gelFoodColor', 'acidDyePowder', 'other'] as const;
export const dyeKindSchema = z.enum(dyeKinds);
export type DyeKind = z.infer<typeof dyeKindSchema>;

export const colorantIdSchema = z.enum(COLORANTS.map((c) => c.id) as [ColorantId, ...ColorantId[]]);

const colorantIdsSchema = z
  .array(colorantIdSchema)
  .max(COLORANTS.length)
  .refine((ids) => new Set(ids).size === ids.length, 'List each colorant once.');

const dyeFields = {
  kind: dyeKindSchema,
  name: nameSchema,
  colorantIds: colorantIdsSchema,
  swatchHex: hexColorSchema,
};

/** POST /api/studios/:slug/dyes */
export const dyeCreateSchema = z.object({
  ...dyeFields,
  colorantIds: colorantIdsSchema.default([]),
});
export type DyeCreate = z.input<typeof dyeCreateSchema>;
/** PATCH /api/studios/:slug/dyes/:dyeId */
export const dyeUpdateSchema = patchOf(dyeFields);
export type DyeUpdate = z.input<typeof dyeUpdateSchema>;

export const dyeSchema = z.object({
  id: idSchema,
  kind: dyeKindSchema,
  name: z.string(),
  colorantIds: z.array(colorantIdSchema),
  /** The colorants by their US and EU names, as a label lists them. */
  colorants: z.array(z.object({ id: colorantIdSchema, fdcName: z.string(), euNumber: z.string() })),
  swatchHex: z.string(),
  ...timestampsSchema.shape,
});
export type Dye = z.infer<typeof dyeSchema>;
export const dyeListSchema = pageOf(dyeSchema);
export type DyeList = z.infer<typeof dyeListSchema>;

const stockFields = {
  dyeId: idSchema,
  /** Grams of dye per 100 mL of solution (% w/v). */
  stockStrengthPct: z.number().positive().max(100),
  volumeMadeMl: z.number().positive().max(100_000),
  madeOn: z.iso.date(),
};

/** POST /api/studios/:slug/stock-solutions; `volumeLeftMl` defaults to the volume made. */
export const stockSolutionCreateSchema = z
  .object({ ...stockFields, volumeLeftMl: z.number().min(0).max(100_000).optional() })
  .refine((s) => s.volumeLeftMl === undefined || s.volumeLeftMl <= s.volumeMadeMl, {
    message: 'A jar cannot hold more than was made.',
    path: ['volumeLeftMl'],
  });
export type StockSolutionCreate = z.input<typeof stockSolutionCreateSchema>;

/** PATCH /api/studios/:slug/stock-solutions/:stockId; what is left changes only by adjustment. */
export const stockSolutionUpdateSchema = patchOf(stockFields);
export type StockSolutionUpdate = z.input<typeof stockSolutionUpdateSchema>;

/** POST /api/studios/:slug/stock-solutions/:stockId/adjustments: what is in the jar now, and why. */
export const stockAdjustmentCreateSchema = z.object({
  volumeLeftMl: z.number().min(0).max(100_000),
  reason: z.string().trim().min(3).max(200),
});
export type StockAdjustmentCreate = z.input<typeof stockAdjustmentCreateSchema>;

export const stockAdjustmentSchema = z.object({
  id: idSchema,
  volumeLeftBeforeMl: z.number(),
  volumeLeftAfterMl: z.number(),
  reason: z.string(),
  adjustedByName: z.string().nullable(),
  createdAt: z.string(),
});
export type StockAdjustment = z.infer<typeof stockAdjustmentSchema>;

export const stockSolutionSchema = z.object({
  id: idSchema,
  dyeId: idSchema,
  dyeName: z.string(),
  dyeKind: dyeKindSchema,
  swatchHex: z.string(),
  stockStrengthPct: z.number(),
  volumeMadeMl: z.number(),
  madeOn: z.string(),
  volumeLeftMl: z.number(),
  /** Grams of dye still in the jar: strength × volume left ÷ 100. */
  dyeLeftG: z.number(),
  ...timestampsSchema.shape,
});
export type StockSolution = z.infer<typeof stockSolutionSchema>;
export const stockSolutionListSchema = pageOf(stockSolutionSchema);
export type StockSolutionList = z.infer<typeof stockSolutionListSchema>;

/** GET /api/studios/:slug/stock-solutions/:stockId: the jar with its latest adjustments. */
export const stockSolutionDetailSchema = stockSolutionSchema.extend({
  adjustments: z.array(stockAdjustmentSchema),
});
export type StockSolutionDetail = z.infer<typeof stockSolutionDetailSchema>;
