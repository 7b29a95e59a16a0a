import { z } from 'zod';
import { closenessSchema } from './submissions.ts';
import { techniqueSchema } from './workbench-colorways.ts';
import { idSchema, pageOf, pageQuerySchema } from './workbench-common.ts';

// The month's public gallery (approved and featured skeins only) and the host's recap running
// order (featured skeins whose makers said yes, and the month's colorways, each with a note).

/** GET /api/studios/:slug/dye-alongs/:dyeAlongId/gallery */
export const galleryQuerySchema = pageQuerySchema.extend({ colorwayId: idSchema.optional() });

export const galleryPhotoSchema = z.object({
  id: idSchema,
  width: z.number().int(),
  height: z.number().int(),
  thumbWidth: z.number().int(),
  thumbHeight: z.number().int(),
  webUrl: z.string(),
  thumbUrl: z.string(),
});

export const gallerySkeinSchema = z.object({
  id: idSchema,
  makerName: z.string(),
  colorway: z.object({ id: idSchema, name: z.string() }).nullable(),
  baseName: z.string(),
  fiberContent: z.array(z.object({ fiber: z.string(), pct: z.number() })),
  dyesUsed: z.array(z.string()),
  notes: z.string(),
  featured: z.boolean(),
  closeness: closenessSchema.nullable(),
  photos: z.array(galleryPhotoSchema),
  sharedAt: z.string(),
});
export type GallerySkein = z.infer<typeof gallerySkeinSchema>;

/** The host's own photo of a finished colorway (the newest from the workbench), public here. */
export const galleryColorwayPhotoSchema = z.object({
  width: z.number().int(),
  height: z.number().int(),
  thumbWidth: z.number().int(),
  thumbHeight: z.number().int(),
  webUrl: z.string(),
  thumbUrl: z.string(),
});

export const galleryColorwaySchema = z.object({
  id: idSchema,
  name: z.string(),
  technique: techniqueSchema,
  /** The colors the colorway aims at, each with a name (never a color alone). */
  swatches: z.array(z.object({ hex: z.string(), name: z.string() })),
  photo: galleryColorwayPhotoSchema.nullable(),
});
export type GalleryColorway = z.infer<typeof galleryColorwaySchema>;

export const gallerySchema = pageOf(gallerySkeinSchema).extend({
  /** The month's colorways, for the filter and for the host's own skeins beside the community's. */
  colorways: z.array(galleryColorwaySchema),
});
export type Gallery = z.infer<typeof gallerySchema>;

export const recapItemInputSchema = z.union([
  z.object({ submissionId: idSchema, note: z.string().trim().max(500).default('') }).strict(),
  z.object({ colorwayId: idSchema, note: z.string().trim().max(500).default('') }).strict(),
]);

/** PUT …/dye-alongs/:dyeAlongId/recap: the whole running order, first item first. */
export const recapUpdateSchema = z.object({
  items: z
    .array(recapItemInputSchema)
    .max(60)
    .refine((items) => {
      const keys = items.map((i) => ('submissionId' in i ? i.submissionId : i.colorwayId));
      return new Set(keys).size === keys.length;
    }, 'List each skein and colorway once.'),
});
export type RecapUpdate = z.input<typeof recapUpdateSchema>;

export const recapItemSchema = z.discriminatedUnion('kind', [
  z.object({
    id: idSchema,
    position: z.number().int(),
    kind: z.literal('skein'),
    note: z.string(),
    skein: gallerySkeinSchema,
  }),
  z.object({
    id: idSchema,
    position: z.number().int(),
    kind: z.literal('colorway'),
    note: z.string(),
    colorway: galleryColorwaySchema,
  }),
]);
export type RecapItem = z.infer<typeof recapItemSchema>;

export const recapSchema = z.object({
  dyeAlongId: idSchema,
  items: z.array(recapItemSchema),
  /** What may still enter: featured skeins with consent, and colorways, not yet in the order. */
  candidates: z.object({
    skeins: z.array(gallerySkeinSchema),
    colorways: z.array(galleryColorwaySchema),
  }),
});
export type Recap = z.infer<typeof recapSchema>;
