import { z } from 'zod';
import { idSchema, pageOf, pageQuerySchema, timestampsSchema } from './workbench-common.ts';

// Images that went through the upload pipeline, and their palettes.

export const imagePurposeSchema = z.enum(['inspiration', 'colorwayPhoto']);
export type ImagePurpose = z.infer<typeof imagePurposeSchema>;

/** Text fields of POST /api/studios/:slug/images (multipart; the file goes in the `image` field). */
export const imageUploadFieldsSchema = z
  .object({
    purpose: imagePurposeSchema.default('inspiration'),
    colorwayId: idSchema.optional(),
    swatchCount: z.coerce.number().int().min(1).max(8).default(6),
  })
  .refine((f) => f.purpose !== 'colorwayPhoto' || f.colorwayId !== undefined, {
    message: 'A colorway photo needs its colorway.',
    path: ['colorwayId'],
  });
export type ImageUploadFields = z.input<typeof imageUploadFieldsSchema>;

export const swatchSchema = z.object({
  id: idSchema,
  hex: z.string(),
  lab: z.object({ l: z.number(), a: z.number(), b: z.number() }),
  /** Share of the image; null for a swatch picked from a point. */
  share: z.number().nullable(),
  /** Readable name from dye-kit (ISCC–NBS approximation). */
  name: z.string(),
  /** The host's own name; empty until renamed. */
  label: z.string(),
});
export type Swatch = z.infer<typeof swatchSchema>;

export const imageSchema = z.object({
  id: idSchema,
  purpose: imagePurposeSchema,
  colorwayId: idSchema.nullable(),
  contentType: z.string(),
  width: z.number().int(),
  height: z.number().int(),
  bytes: z.number().int(),
  thumbWidth: z.number().int(),
  thumbHeight: z.number().int(),
  palette: z.array(swatchSchema),
  /** Same-origin URLs that check the asker's role on every request. */
  webUrl: z.string(),
  thumbUrl: z.string(),
  ...timestampsSchema.shape,
});
export type Image = z.infer<typeof imageSchema>;
export const imageListSchema = pageOf(imageSchema);
export type ImageList = z.infer<typeof imageListSchema>;

export const imageListQuerySchema = pageQuerySchema.extend({
  purpose: imagePurposeSchema.optional(),
  colorwayId: idSchema.optional(),
});

/** PUT /api/studios/:slug/images/:imageId/palette: the swatches kept, in order, with names. */
export const paletteEditSchema = z.object({
  swatches: z
    .array(z.object({ id: idSchema, label: z.string().trim().max(60) }))
    .max(16)
    .refine((s) => new Set(s.map((x) => x.id)).size === s.length, 'List each swatch once.'),
});
export type PaletteEdit = z.input<typeof paletteEditSchema>;

/** POST .../palette/pick: add the color under a point (fractions of width and height). */
export const palettePickSchema = z.object({
  x: z.number().min(0).max(1),
  y: z.number().min(0).max(1),
  label: z.string().trim().max(60).default(''),
});
export type PalettePick = z.input<typeof palettePickSchema>;
