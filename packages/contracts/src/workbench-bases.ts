import { z } from 'zod';
import { FIBER_NAMES, type FiberName } from '@vatside/dye-kit';
import {
  idSchema,
  nameSchema,
  pageOf,
  patchOf,
  timestampsSchema,
  warningSchema,
} from './workbench-common.ts';

// Yarn bases and dye pots.

export const fiberNameSchema = z.enum(FIBER_NAMES as [FiberName, ...FiberName[]]);

export const fiberContentSchema = z
  .array(z.object({ fiber: fiberNameSchema, pct: z.number().positive().max(100) }))
  .min(1)
  .max(FIBER_NAMES.length);

const baseFields = {
  name: nameSchema,
  fiberContent: fiberContentSchema,
  superwash: z.boolean(),
  /** Craft Yarn Council Standard Yarn Weight System: 0 lace … 7 jumbo. */
  weightClass: z.number().int().min(0).max(7),
  skeinWeightG: z.number().positive().max(5_000),
  skeinLengthM: z.number().positive().max(20_000),
  lot: z.string().trim().max(40),
};

/** POST /api/studios/:slug/bases */
export const baseCreateSchema = z.object({ ...baseFields, lot: baseFields.lot.default('') });
export type BaseCreate = z.input<typeof baseCreateSchema>;
/** PATCH /api/studios/:slug/bases/:baseId */
export const baseUpdateSchema = patchOf(baseFields);
export type BaseUpdate = z.input<typeof baseUpdateSchema>;

export const baseSchema = z.object({
  id: idSchema,
  name: z.string(),
  fiberContent: z.array(z.object({ fiber: fiberNameSchema, pct: z.number() })),
  superwash: z.boolean(),
  weightClass: z.number().int(),
  skeinWeightG: z.number(),
  skeinLengthM: z.number(),
  lot: z.string(),
  /** dye-kit's fiber check: how much of the yarn takes acid dye and food color, and warnings. */
  fiberCheck: z.object({
    takesDyePct: z.number(),
    doesNotTakePct: z.number(),
    warnings: z.array(warningSchema),
  }),
  ...timestampsSchema.shape,
});
export type Base = z.infer<typeof baseSchema>;
export const baseListSchema = pageOf(baseSchema);
export type BaseList = z.infer<typeof baseListSchema>;

export const potMaterials = ['stainlessSteel', 'enamel', 'aluminum', 'other'] as const;
export const potMaterialSchema = z.enum(potMaterials);

const potFields = {
  name: nameSchema,
  capacityMl: z.number().positive().max(200_000),
  material: potMaterialSchema,
};

/** POST /api/studios/:slug/pots */
export const potCreateSchema = z.object(potFields);
export type PotCreate = z.input<typeof potCreateSchema>;
/** PATCH /api/studios/:slug/pots/:potId */
export const potUpdateSchema = patchOf(potFields);
export type PotUpdate = z.input<typeof potUpdateSchema>;

export const potSchema = z.object({
  id: idSchema,
  name: z.string(),
  capacityMl: z.number(),
  material: potMaterialSchema,
  /** Aluminum reacts with the acid in the bath (common practice): flagged wherever it is used. */
  reactsWithAcid: z.boolean(),
  ...timestampsSchema.shape,
});
export type Pot = z.infer<typeof potSchema>;
export const potListSchema = pageOf(potSchema);
export type PotList = z.infer<typeof potListSchema>;
