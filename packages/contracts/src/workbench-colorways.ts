import { z } from 'zod';
import type { AcidAmount, ScaledRecipe } from '@vatside/dye-kit';
import { colorantIdSchema } from './workbench-shelf.ts';
import {
  hexColorSchema,
  idSchema,
  nameSchema,
  pageOf,
  patchOf,
  timestampsSchema,
  warningSchema,
} from './workbench-common.ts';

// Colorways: dye-kit's Recipe (lines, liquor ratio, acid) written for the host's skein, plus what
// it aims at. Lines carry ids so run-sheet steps can point at them.

export const techniques = [
  'immersion',
  'dipGradient',
  'speckle',
  'layeredPour',
  'leftovers',
] as const;
export const techniqueSchema = z.enum(techniques);

/** Acid dye from a stock solution at a depth of shade (% on weight of dry fiber). */
const stockLineSchema = z.object({
  id: idSchema.optional(),
  kind: z.literal('stock'),
  /** A jar on the shelf: its dye name and strength fill the line when they are left out. */
  stockSolutionId: idSchema.nullable().optional(),
  dyeName: z.string().trim().min(1).max(80).optional(),
  stockStrengthPct: z.number().positive().max(100).optional(),
  depthOfShadePct: z.number().min(0).max(100),
});

/** Household food color per 100 g of dry fiber (its strength is unknown). */
const foodColorLineSchema = z.object({
  id: idSchema.optional(),
  kind: z.literal('foodColor'),
  /** A dye on the shelf: its name and colorants fill the line when they are left out. */
  dyeId: idSchema.nullable().optional(),
  colorName: z.string().trim().min(1).max(80).optional(),
  amountPer100g: z.number().min(0).max(1_000),
  unit: z.enum(['mL', 'drop', 'gGel']),
  dropsPerMl: z.number().positive().max(100).optional(),
  colorants: z.array(colorantIdSchema).max(7).optional(),
});

export const recipeLineInputSchema = z
  .discriminatedUnion('kind', [stockLineSchema, foodColorLineSchema])
  .superRefine((line, ctx) => {
    if (line.kind === 'stock' && !line.stockSolutionId) {
      if (!line.dyeName)
        ctx.addIssue({
          code: 'custom',
          path: ['dyeName'],
          message: 'Name the dye or pick a stock solution.',
        });
      if (line.stockStrengthPct === undefined)
        ctx.addIssue({
          code: 'custom',
          path: ['stockStrengthPct'],
          message: 'Give the stock strength or pick a stock solution.',
        });
    }
    if (line.kind === 'foodColor' && !line.dyeId && !line.colorName) {
      ctx.addIssue({
        code: 'custom',
        path: ['colorName'],
        message: 'Name the color or pick a dye.',
      });
    }
  });
export type RecipeLineInput = z.input<typeof recipeLineInputSchema>;

export const recipeAcidSchema = z.discriminatedUnion('acid', [
  z.object({
    acid: z.literal('vinegar'),
    /** Acetic acid in the vinegar, %; table vinegar is commonly 5 %. */
    acidStrengthPct: z.number().positive().max(100),
    amountMl: z.number().min(0).max(100_000).optional(),
  }),
  z.object({ acid: z.literal('citric'), amountMl: z.number().min(0).max(100_000).optional() }),
]);

export const targetSwatchSchema = z.object({
  hex: hexColorSchema,
  name: z.string().trim().max(60),
});

const colorwayFields = {
  name: nameSchema,
  technique: techniqueSchema,
  baseId: idSchema.nullable(),
  potId: idSchema.nullable(),
  skeinCount: z.number().int().min(1).max(100),
  /** Dry weight of one of the host's skeins, g; defaults to the base's skein weight. */
  weightOfGoodsG: z.number().positive().max(5_000),
  /** Bath : dry fiber by weight, e.g. 30 for 30:1. */
  liquorRatio: z.number().positive().max(200),
  acid: recipeAcidSchema,
  recipeLines: z.array(recipeLineInputSchema).max(24),
  targetSwatches: z.array(targetSwatchSchema).max(16),
  notes: z.string().trim().max(5_000),
};

/** POST /api/studios/:slug/colorways */
export const colorwayCreateSchema = z.object({
  ...colorwayFields,
  baseId: colorwayFields.baseId.default(null),
  potId: colorwayFields.potId.default(null),
  skeinCount: colorwayFields.skeinCount.default(1),
  weightOfGoodsG: colorwayFields.weightOfGoodsG.optional(),
  liquorRatio: colorwayFields.liquorRatio.default(30),
  acid: recipeAcidSchema.default({ acid: 'vinegar', acidStrengthPct: 5 }),
  recipeLines: colorwayFields.recipeLines.default([]),
  targetSwatches: colorwayFields.targetSwatches.default([]),
  notes: colorwayFields.notes.default(''),
});
export type ColorwayCreate = z.input<typeof colorwayCreateSchema>;

/** PATCH /api/studios/:slug/colorways/:colorwayId; `recipeLines` replaces every line. */
export const colorwayUpdateSchema = patchOf(colorwayFields);
export type ColorwayUpdate = z.input<typeof colorwayUpdateSchema>;

export const recipeLineSchema = z.discriminatedUnion('kind', [
  z.object({
    id: idSchema,
    kind: z.literal('stock'),
    stockSolutionId: idSchema.nullable(),
    dyeName: z.string(),
    stockStrengthPct: z.number(),
    depthOfShadePct: z.number(),
  }),
  z.object({
    id: idSchema,
    kind: z.literal('foodColor'),
    dyeId: idSchema.nullable(),
    colorName: z.string(),
    amountPer100g: z.number(),
    unit: z.enum(['mL', 'drop', 'gGel']),
    dropsPerMl: z.number().optional(),
    colorants: z.array(colorantIdSchema).optional(),
  }),
]);
export type RecipeLine = z.infer<typeof recipeLineSchema>;

export const colorwaySummarySchema = z.object({
  id: idSchema,
  name: z.string(),
  technique: techniqueSchema,
  baseId: idSchema.nullable(),
  potId: idSchema.nullable(),
  skeinCount: z.number().int(),
  weightOfGoodsG: z.number(),
  liquorRatio: z.number(),
  acid: recipeAcidSchema,
  recipeLines: z.array(recipeLineSchema),
  targetSwatches: z.array(z.object({ hex: z.string(), name: z.string() })),
  notes: z.string(),
  ...timestampsSchema.shape,
});
export type ColorwaySummary = z.infer<typeof colorwaySummarySchema>;
export const colorwayListSchema = pageOf(colorwaySummarySchema);
export type ColorwayList = z.infer<typeof colorwayListSchema>;

/** dye-kit's amounts for a bath, the acid with its rule, and the real-pot warnings. */
export const computedAmountsSchema = z.object({
  system: z.enum(['us', 'metric']),
  amounts: z.custom<ScaledRecipe>(),
  acid: z.custom<AcidAmount>(),
  warnings: z.array(warningSchema),
  safetyNote: z.string(),
});
export type ComputedAmounts = z.infer<typeof computedAmountsSchema>;

/** GET /api/studios/:slug/colorways/:colorwayId: amounts for the host's skeins in their pot. */
export const colorwayDetailSchema = colorwaySummarySchema.extend({
  computed: computedAmountsSchema,
});
export type ColorwayDetail = z.infer<typeof colorwayDetailSchema>;

export const measureSystemSchema = z.enum(['us', 'metric']);

/** Query of GET /api/studios/:slug/colorways/:colorwayId (units for the computed amounts). */
export const colorwayDetailQuerySchema = z.object({ system: measureSystemSchema.optional() });

/** Query of GET .../colorways/:colorwayId/amounts: a weight or a number of skeins. */
export const amountsQuerySchema = z
  .object({
    weightOfGoodsG: z.coerce.number().positive().max(50_000).optional(),
    skeins: z.coerce.number().int().min(1).max(100).optional(),
    potCapacityMl: z.coerce.number().positive().max(200_000).optional(),
    system: measureSystemSchema.optional(),
  })
  .refine((q) => q.weightOfGoodsG === undefined || q.skeins === undefined, {
    message: 'Give a weight or a number of skeins, not both.',
    path: ['skeins'],
  });
export type AmountsQuery = z.input<typeof amountsQuerySchema>;

export const cautionKinds = ['hotBath', 'acid', 'powder', 'none'] as const;
export const cautionKindSchema = z.enum(cautionKinds);

const stepFields = {
  instruction: z.string().trim().min(1).max(500),
  recipeLineId: idSchema.nullable(),
  timerSeconds: z.number().int().min(1).max(86_400).nullable(),
  temperatureC: z.number().min(0).max(100).nullable(),
  /** What the bath looks like at that temperature, for people without a thermometer. */
  visualCue: z.string().trim().min(1).max(200).nullable(),
  caution: cautionKindSchema,
};

const cueWithTemperature = (s: { temperatureC?: number | null; visualCue?: string | null }) =>
  s.temperatureC === undefined || s.temperatureC === null || Boolean(s.visualCue);
// A function, not a shared object: zod rewrites the params object it is given.
const cueMessage = () => ({
  message:
    'Describe what the bath looks like at this temperature, for people without a thermometer.',
  path: ['visualCue'],
});

/** POST /api/studios/:slug/colorways/:colorwayId/steps: appended at the end. */
export const stepCreateSchema = z
  .object({
    ...stepFields,
    recipeLineId: stepFields.recipeLineId.default(null),
    timerSeconds: stepFields.timerSeconds.default(null),
    temperatureC: stepFields.temperatureC.default(null),
    visualCue: stepFields.visualCue.default(null),
    caution: stepFields.caution.default('none'),
  })
  .refine(cueWithTemperature, cueMessage());
export type StepCreate = z.input<typeof stepCreateSchema>;

/** PATCH .../steps/:stepId (the cue rule is checked again on the merged step). */
export const stepUpdateSchema = patchOf(stepFields);
export type StepUpdate = z.input<typeof stepUpdateSchema>;
export const stepCueRule = { check: cueWithTemperature, ...cueMessage() };

/** PUT .../steps/order: every step id of the run sheet, in the new order. */
export const stepOrderSchema = z.object({
  stepIds: z
    .array(idSchema)
    .min(1)
    .max(200)
    .refine((ids) => new Set(ids).size === ids.length, 'List each step once.'),
});
export type StepOrder = z.input<typeof stepOrderSchema>;

export const stepSchema = z.object({
  id: idSchema,
  colorwayId: idSchema,
  position: z.number().int(),
  instruction: z.string(),
  recipeLineId: idSchema.nullable(),
  timerSeconds: z.number().int().nullable(),
  temperatureC: z.number().nullable(),
  visualCue: z.string().nullable(),
  caution: cautionKindSchema,
  ...timestampsSchema.shape,
});
export type Step = z.infer<typeof stepSchema>;
export const stepListSchema = z.object({ steps: z.array(stepSchema) });
export type StepList = z.infer<typeof stepListSchema>;
