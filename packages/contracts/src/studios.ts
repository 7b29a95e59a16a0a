import { z } from 'zod';

/** A studio as anyone (even a visitor) may see it. */
export const studioSummarySchema = z.object({
  id: z.string().uuid(),
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/),
  name: z.string().min(1).max(80),
  tagline: z.string().max(160),
  accentHex: z.string().regex(/^#[0-9a-f]{6}$/i),
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
