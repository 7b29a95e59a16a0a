import { z } from 'zod';
import { measureSystemSchema, techniqueSchema } from './workbench-colorways.ts';
import { warningSchema } from './workbench-common.ts';

// What a dye-along needs: the supply list (dyes, acid, yarn, equipment) merged across the
// month's colorways, and the prep checklist for the day before and the hour before.

/** A household measure as dye-kit writes it: "2 tbsp + 1 ½ tsp", and what the spoons hold. */
export const householdSchema = z.object({
  label: z.string(),
  measuredMl: z.number(),
  tooSmallToMeasure: z.boolean(),
});
export type Household = z.infer<typeof householdSchema>;

/** A dye summed over every colorway that uses it (one stock strength, or one food color). */
export const supplyDyeSchema = z.object({
  key: z.string(),
  kind: z.enum(['stock', 'foodColor']),
  name: z.string(),
  /** Stock lines: the solution's strength, % w/v. */
  stockStrengthPct: z.number().nullable(),
  /** Stock lines: mixed from a powder (dust mask when mixing). */
  fromPowder: z.boolean(),
  unit: z.enum(['mL', 'drop', 'gGel']),
  /** Exact total in `unit` across colorways. */
  amount: z.number(),
  /** Liquid volume in mL (stock or liquid color); null for gel. */
  volumeMl: z.number().nullable(),
  /** Grams of powder in that stock (stock lines). */
  dyeMassG: z.number().nullable(),
  /** Household measure for liquids in the chosen system; null for drops and gel. */
  household: householdSchema.nullable(),
  approximate: z.boolean(),
  /** Stock lines: a jar to mix, rounded up with room for spills, and the powder it takes. */
  mix: z.object({ volumeMl: z.number(), powderG: z.number() }).nullable(),
  colorways: z.array(z.string()),
});
export type SupplyDye = z.infer<typeof supplyDyeSchema>;

export const supplyAcidSchema = z.object({
  acid: z.enum(['vinegar', 'citric']),
  acidStrengthPct: z.number().nullable(),
  /** Vinegar liquid, or citric acid crystals measured by spoon, mL. */
  amountMl: z.number(),
  household: householdSchema,
  rules: z.array(z.string()),
  colorways: z.array(z.string()),
});
export type SupplyAcid = z.infer<typeof supplyAcidSchema>;

export const supplyYarnSchema = z.object({
  baseId: z.string().nullable(),
  name: z.string(),
  fiberContent: z.array(z.object({ fiber: z.string(), pct: z.number() })),
  superwash: z.boolean().nullable(),
  skeins: z.number().int(),
  skeinWeightG: z.number(),
  totalWeightG: z.number(),
  colorways: z.array(z.string()),
});
export type SupplyYarn = z.infer<typeof supplyYarnSchema>;

export const supplyEquipmentSchema = z.object({
  key: z.string(),
  item: z.string(),
  detail: z.string(),
});
export type SupplyEquipment = z.infer<typeof supplyEquipmentSchema>;

/** One colorway's bath, for the recipe card and the viewer's own skein. */
export const colorwayBathSchema = z.object({
  colorwayId: z.string(),
  name: z.string(),
  technique: techniqueSchema,
  skeins: z.number().int(),
  weightOfGoodsG: z.number(),
  bathVolumeMl: z.number(),
  water: householdSchema,
  lines: z.array(
    z.object({
      name: z.string(),
      kind: z.enum(['stock', 'foodColor']),
      amount: z.number(),
      unit: z.enum(['mL', 'drop', 'gGel']),
      household: householdSchema.nullable(),
      approximate: z.boolean(),
    }),
  ),
  acid: supplyAcidSchema.omit({ colorways: true, rules: true }).extend({ rule: z.string() }),
  targetSwatches: z.array(z.object({ hex: z.string(), name: z.string() })),
});
export type ColorwayBath = z.infer<typeof colorwayBathSchema>;

export const supplyScopeSchema = z.enum(['hostBatch', 'perSkein']);

export const supplyListSchema = z.object({
  /** hostBatch: the host's skeins of each colorway; perSkein: one skein of each colorway. */
  scope: supplyScopeSchema,
  system: measureSystemSchema,
  /** perSkein: the participant's skein weight, g; hostBatch: null. */
  weightOfGoodsG: z.number().nullable(),
  dyes: z.array(supplyDyeSchema),
  acid: z.array(supplyAcidSchema),
  yarn: z.array(supplyYarnSchema),
  equipment: z.array(supplyEquipmentSchema),
  colorways: z.array(colorwayBathSchema),
  cautions: z.array(z.string()),
  warnings: z.array(warningSchema.extend({ colorway: z.string() })),
  safetyNote: z.string(),
});
export type SupplyList = z.infer<typeof supplyListSchema>;

/** GET .../supply-list: ?scope=perSkein&weightOfGoodsG=50&system=us */
export const supplyListQuerySchema = z.object({
  scope: supplyScopeSchema.default('perSkein'),
  weightOfGoodsG: z.coerce.number().positive().max(5_000).optional(),
  system: measureSystemSchema.optional(),
});

export const prepWhenSchema = z.enum(['dayBefore', 'hourBefore']);
export type PrepWhen = z.infer<typeof prepWhenSchema>;

export const prepItemSchema = z.object({
  id: z.string(),
  text: z.string(),
  when: prepWhenSchema,
  source: z.enum(['runSheet', 'commonPractice', 'host']),
  caution: z.enum(['hotBath', 'acid', 'powder']).nullable(),
});
export type PrepItem = z.infer<typeof prepItemSchema>;

export const prepChecklistSchema = z.object({
  dayBefore: z.array(prepItemSchema),
  hourBefore: z.array(prepItemSchema),
});
export type PrepChecklist = z.infer<typeof prepChecklistSchema>;
