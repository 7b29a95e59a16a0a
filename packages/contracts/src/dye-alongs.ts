import { z } from 'zod';
import { timeZoneSchema } from './account.ts';
import { prepChecklistSchema, prepWhenSchema, supplyListSchema } from './dye-along-supplies.ts';
import { measureSystemSchema, techniqueSchema } from './workbench-colorways.ts';
import { idSchema, pageOf, pageQuerySchema, timestampsSchema } from './workbench-common.ts';
import { swatchSchema } from './workbench-images.ts';

// The month's dye-along: schedule, lifecycle, colorways, and its public page.

export const dyeAlongStatuses = [
  'draft',
  'announced',
  'live',
  'sharing',
  'recap',
  'archived',
] as const;
export const dyeAlongStatusSchema = z.enum(dyeAlongStatuses);
export type DyeAlongStatus = z.infer<typeof dyeAlongStatusSchema>;

/** "2026-12-12T14:00": a wall-clock time, read in `timeZone`. */
const localDateTimeSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, 'Use a local date and time like 2026-12-12T14:00.');

const httpsUrlSchema = z.url({ protocol: /^https$/, message: 'Use an https:// link.' }).max(500);

export const hostPrepItemInputSchema = z.object({
  id: idSchema.optional(),
  text: z.string().trim().min(1).max(200),
  when: prepWhenSchema,
});

const colorwayIdsSchema = z
  .array(idSchema)
  .max(12)
  .refine((ids) => new Set(ids).size === ids.length, 'List each colorway once.');

const fields = {
  title: z.string().trim().min(1).max(120),
  description: z.string().trim().max(5_000),
  /** The start as the host's wall clock in `timeZone`; or give `startsAt` as an instant. */
  startsAtLocal: localDateTimeSchema,
  startsAt: z.iso.datetime({ offset: true }),
  timeZone: timeZoneSchema,
  expectedLengthMin: z.number().int().min(15).max(600),
  streamUrl: httpsUrlSchema.nullable(),
  inspirationImageId: idSchema.nullable(),
  /** The month's colorways in the order they are dyed. */
  colorwayIds: colorwayIdsSchema,
  shareOpensAt: z.iso.datetime({ offset: true }).nullable(),
  shareClosesAt: z.iso.datetime({ offset: true }).nullable(),
  hostPrepItems: z.array(hostPrepItemInputSchema).max(30),
};

const oneStart = (d: { startsAt?: unknown; startsAtLocal?: unknown }) =>
  !(d.startsAt !== undefined && d.startsAtLocal !== undefined);
const oneStartMessage = () => ({
  message: 'Give the start as startsAtLocal or startsAt, not both.',
  path: ['startsAt'],
});

/** POST /api/studios/:slug/dye-alongs: starts as a draft. */
export const dyeAlongCreateSchema = z
  .object({
    ...fields,
    description: fields.description.default(''),
    startsAtLocal: fields.startsAtLocal.optional(),
    startsAt: fields.startsAt.optional(),
    expectedLengthMin: fields.expectedLengthMin.default(90),
    streamUrl: fields.streamUrl.default(null),
    inspirationImageId: fields.inspirationImageId.default(null),
    colorwayIds: fields.colorwayIds.default([]),
    shareOpensAt: fields.shareOpensAt.default(null),
    shareClosesAt: fields.shareClosesAt.default(null),
    hostPrepItems: fields.hostPrepItems.default([]),
  })
  .refine(oneStart, oneStartMessage())
  .refine((d) => d.startsAt !== undefined || d.startsAtLocal !== undefined, {
    message: 'When does it start? Give startsAtLocal (with timeZone) or startsAt.',
    path: ['startsAtLocal'],
  });
export type DyeAlongCreate = z.input<typeof dyeAlongCreateSchema>;

/** PATCH /api/studios/:slug/dye-alongs/:dyeAlongId; lists replace the whole list. */
export const dyeAlongUpdateSchema = z
  .object(fields)
  .partial()
  .refine((p) => Object.values(p).some((v) => v !== undefined), 'Change at least one field.')
  .refine(oneStart, oneStartMessage());
export type DyeAlongUpdate = z.input<typeof dyeAlongUpdateSchema>;

/** POST .../transitions: move the dye-along on (the server refuses what makes no sense). */
export const dyeAlongTransitionSchema = z.object({ to: dyeAlongStatusSchema });
export type DyeAlongTransition = z.input<typeof dyeAlongTransitionSchema>;

/** GET /api/studios/:slug/dye-alongs?month=2026-12: the month is read in `timeZone` if given. */
export const dyeAlongListQuerySchema = pageQuerySchema.extend({
  month: z
    .string()
    .regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'Use a month like 2026-12.')
    .optional(),
  timeZone: timeZoneSchema.optional(),
  status: dyeAlongStatusSchema.optional(),
});

/** A start instant shown on someone's own clock. */
export const zonedTimeSchema = z.object({
  timeZone: z.string(),
  /** "2026-12-12T14:00" on that clock. */
  local: z.string(),
  /** "Saturday, December 12, 2026 at 2:00 PM AST". */
  label: z.string(),
});
export type ZonedTime = z.infer<typeof zonedTimeSchema>;

const colorwayRefSchema = z.object({
  id: idSchema,
  name: z.string(),
  technique: techniqueSchema,
  position: z.number().int(),
});

export const dyeAlongSchema = z.object({
  id: idSchema,
  studioId: idSchema,
  title: z.string(),
  description: z.string(),
  status: dyeAlongStatusSchema,
  startsAt: z.string(),
  timeZone: z.string(),
  /** The start on the host's clock. */
  startsAtHost: zonedTimeSchema,
  expectedLengthMin: z.number().int(),
  streamUrl: z.string().nullable(),
  inspirationImageId: idSchema.nullable(),
  colorways: z.array(colorwayRefSchema),
  shareOpensAt: z.string().nullable(),
  shareClosesAt: z.string().nullable(),
  hostPrepItems: z.array(z.object({ id: idSchema, text: z.string(), when: prepWhenSchema })),
  statusChangedAt: z.string(),
  announcedAt: z.string().nullable(),
  /** Where the next status would be refused, and why (for the host's buttons). */
  nextStatuses: z.array(
    z.object({ to: dyeAlongStatusSchema, allowed: z.boolean(), reasons: z.array(z.string()) }),
  ),
  ...timestampsSchema.shape,
});
export type DyeAlong = z.infer<typeof dyeAlongSchema>;

/** GET .../:dyeAlongId for the host and moderators: the dye-along and its e-mails so far. */
export const dyeAlongDetailSchema = dyeAlongSchema.extend({
  mail: z.object({
    queued: z.number().int(),
    sent: z.number().int(),
    skipped: z.number().int(),
    failed: z.number().int(),
  }),
});
export type DyeAlongDetail = z.infer<typeof dyeAlongDetailSchema>;

export const dyeAlongListSchema = pageOf(dyeAlongSchema);
export type DyeAlongList = z.infer<typeof dyeAlongListSchema>;

/** Query of the public page: the skein and units the amounts are for, and the clock to show. */
export const publicDyeAlongQuerySchema = z.object({
  weightOfGoodsG: z.coerce.number().positive().max(5_000).optional(),
  system: measureSystemSchema.optional(),
  timeZone: timeZoneSchema.optional(),
});

/** GET .../:dyeAlongId/public: what the viewer's page shows, for visitors too once announced. */
export const publicDyeAlongSchema = z.object({
  id: idSchema,
  studio: z.object({ slug: z.string(), name: z.string() }),
  title: z.string(),
  description: z.string(),
  status: dyeAlongStatusSchema,
  startsAt: z.string(),
  endsAt: z.string(),
  hostTimeZone: z.string(),
  startsAtHost: zonedTimeSchema,
  /** On the asker's clock: the query's zone, else their profile's, else the host's. */
  startsAtLocal: zonedTimeSchema,
  expectedLengthMin: z.number().int(),
  streamUrl: z.string().nullable(),
  inspiration: z
    .object({
      webUrl: z.string(),
      thumbUrl: z.string(),
      width: z.number().int(),
      height: z.number().int(),
      palette: z.array(swatchSchema),
    })
    .nullable(),
  shareOpensAt: z.string().nullable(),
  shareClosesAt: z.string().nullable(),
  supplyList: supplyListSchema,
  prepChecklist: prepChecklistSchema,
  cautions: z.array(z.string()),
  calendarUrl: z.string(),
});
export type PublicDyeAlong = z.infer<typeof publicDyeAlongSchema>;

/** Where the viewer app shows these pages; e-mails link here. */
export const viewerPaths = {
  dyeAlong: (slug: string, dyeAlongId: string) => `/s/${slug}/dye-alongs/${dyeAlongId}`,
  unsubscribe: (token: string) => `/unsubscribe?token=${encodeURIComponent(token)}`,
};
