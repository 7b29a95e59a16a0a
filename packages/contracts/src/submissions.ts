import { z } from 'zod';
import { fiberContentSchema } from './workbench-bases.ts';
import {
  idSchema,
  pageOf,
  pageQuerySchema,
  patchOf,
  timestampsSchema,
} from './workbench-common.ts';
import { swatchSchema } from './workbench-images.ts';

// A viewer's shared skein: photos with the yarn area marked, what went into it, consent to be
// featured, its review status, and how close it came to the month's inspiration.

/** One share carries one to four photos, sent together in one multipart request. */
export const MAX_SHARE_PHOTOS = 4;
/** Multipart field names of POST /api/studios/:slug/dye-alongs/:dyeAlongId/submissions. */
export const SHARE_PHOTOS_FIELD = 'photos';
/** A JSON string matching `submissionCreateSchema`. */
export const SHARE_DETAILS_FIELD = 'details';

export const submissionStatuses = [
  'waiting',
  'approved',
  'featured',
  'needsChanges',
  'rejected',
] as const;
export const submissionStatusSchema = z.enum(submissionStatuses);
export type SubmissionStatus = z.infer<typeof submissionStatusSchema>;

/** ΔE2000 bands from the references: < 5, 5–10, 10–20, > 20. Words only, never a score. */
export const closenessBandSchema = z.enum(['veryClose', 'close', 'sameFamily', 'ownStory']);
export type ClosenessBand = z.infer<typeof closenessBandSchema>;

const fraction = z.number().min(0).max(1);

/** The yarn area as a rectangle in fractions of the photo as it is shown (upright). */
export const yarnCropSchema = z
  .object({ x: fraction, y: fraction, width: fraction.positive(), height: fraction.positive() })
  .refine((c) => c.x + c.width <= 1.000001 && c.y + c.height <= 1.000001, {
    message: 'The yarn area must lie inside the photo.',
  });
export type YarnCrop = z.infer<typeof yarnCropSchema>;
export const WHOLE_PHOTO: YarnCrop = { x: 0, y: 0, width: 1, height: 1 };

const detailFields = {
  /** One of the month's colorways, or null when it was the sharer's own idea. */
  colorwayId: idSchema.nullable(),
  baseName: z.string().trim().min(1).max(120),
  fiberContent: fiberContentSchema.or(z.array(z.never()).length(0)),
  dyesUsed: z
    .array(z.string().trim().min(1).max(80))
    .max(20)
    .refine((d) => new Set(d.map((x) => x.toLowerCase())).size === d.length, 'List each dye once.'),
  notes: z.string().trim().max(2_000),
};

/** The `details` field of a share; `crops` follow the photos' order (whole photo if left out). */
export const submissionCreateSchema = z.object({
  colorwayId: detailFields.colorwayId.default(null),
  baseName: detailFields.baseName,
  fiberContent: detailFields.fiberContent.default([]),
  dyesUsed: detailFields.dyesUsed.default([]),
  notes: detailFields.notes.default(''),
  consentToFeature: z.boolean().default(false),
  crops: z.array(yarnCropSchema).min(1).max(MAX_SHARE_PHOTOS).optional(),
});
export type SubmissionCreate = z.input<typeof submissionCreateSchema>;

/**
 * PATCH /api/studios/:slug/my-submissions/:submissionId: while waiting or sent back. An edit of
 * a skein sent back puts it in the queue again.
 */
export const submissionUpdateSchema = patchOf({
  ...detailFields,
  crops: z
    .array(z.object({ photoId: idSchema, crop: yarnCropSchema }))
    .min(1)
    .max(MAX_SHARE_PHOTOS),
});
export type SubmissionUpdate = z.input<typeof submissionUpdateSchema>;

/** PUT …/my-submissions/:submissionId/consent: saying no takes a featured skein out of the recap. */
export const consentSchema = z.object({ consentToFeature: z.boolean() });
export type ConsentUpdate = z.input<typeof consentSchema>;

export const submissionPhotoSchema = z.object({
  id: idSchema,
  position: z.number().int(),
  width: z.number().int(),
  height: z.number().int(),
  thumbWidth: z.number().int(),
  thumbHeight: z.number().int(),
  yarnCrop: yarnCropSchema,
  /** Same-origin URLs: public once approved, otherwise only for the sharer and the staff. */
  webUrl: z.string(),
  thumbUrl: z.string(),
});
export type SubmissionPhoto = z.infer<typeof submissionPhotoSchema>;

export const closenessSchema = z.object({ band: closenessBandSchema, message: z.string() });
export type Closeness = z.infer<typeof closenessSchema>;

export const submissionSchema = z.object({
  id: idSchema,
  dyeAlong: z.object({ id: idSchema, title: z.string() }),
  colorway: z.object({ id: idSchema, name: z.string() }).nullable(),
  baseName: z.string(),
  fiberContent: z.array(z.object({ fiber: z.string(), pct: z.number() })),
  dyesUsed: z.array(z.string()),
  notes: z.string(),
  consentToFeature: z.boolean(),
  status: submissionStatusSchema,
  /** Why it was sent back or declined, in the moderator's words. */
  reason: z.string().nullable(),
  /** Null when the month has no inspiration palette to compare with. */
  closeness: closenessSchema.nullable(),
  /** Main colors of the marked yarn areas. */
  yarnPalette: z.array(swatchSchema),
  photos: z.array(submissionPhotoSchema),
  waitingSince: z.string(),
  ...timestampsSchema.shape,
});
export type Submission = z.infer<typeof submissionSchema>;
export const submissionListSchema = pageOf(submissionSchema);
export type SubmissionList = z.infer<typeof submissionListSchema>;

/** GET /api/studios/:slug/my-submissions */
export const mySubmissionsQuerySchema = pageQuerySchema.extend({ dyeAlongId: idSchema.optional() });

/** Lighting tips shown beside the camera button (common practice in yarn photography). */
export const PHOTO_TIPS = [
  'Daylight near a window, out of direct sun.',
  'No flash: it washes out the colors.',
  'A plain, light background.',
] as const;
