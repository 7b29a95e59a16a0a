import { z } from 'zod';
import { studioRoleSchema } from './roles.ts';

const slugSchema = z
  .string()
  .min(3)
  .max(64)
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lowercase letters, digits and single dashes.');
const hexSchema = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'Use a color like #1f6f78.');

/** A studio as anyone (even a visitor) may see it. */
export const studioSummarySchema = z.object({
  id: z.string().uuid(),
  slug: slugSchema,
  name: z.string().min(1).max(80),
  tagline: z.string().max(160),
  accentHex: hexSchema,
});
export type StudioSummary = z.infer<typeof studioSummarySchema>;

/** GET /api/studios */
export const studioListSchema = z.object({
  studios: z.array(studioSummarySchema),
});
export type StudioList = z.infer<typeof studioListSchema>;

/** Query of GET /api/studios */
export const studioListQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(100).default(50),
});

/** POST /api/studios: the person who creates a studio becomes its host. */
export const studioCreateSchema = z.object({
  name: z.string().trim().min(2).max(80),
  slug: slugSchema,
  tagline: z.string().trim().max(160).default(''),
  accentHex: hexSchema,
});
export type StudioCreate = z.infer<typeof studioCreateSchema>;

/** GET /api/studios/:slug: the public page plus where the asker stands. */
export const studioDetailSchema = studioSummarySchema.extend({
  hostNames: z.array(z.string()),
  followerCount: z.number().int().nonnegative(),
  myRole: z.union([studioRoleSchema, z.literal('visitor')]),
  mailOptIn: z.boolean(),
});
export type StudioDetail = z.infer<typeof studioDetailSchema>;

/** PUT /api/studios/:slug/follow */
export const followSchema = z.object({
  mailOptIn: z.boolean().default(false),
});
export type Follow = z.infer<typeof followSchema>;
