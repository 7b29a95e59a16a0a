import { z } from 'zod';

export const serviceCheckSchema = z.object({
  ok: z.boolean(),
  latencyMs: z.number().nonnegative(),
  detail: z.string().optional(),
});
export type ServiceCheck = z.infer<typeof serviceCheckSchema>;

/** GET /api/health: reachability of each real service the app depends on. */
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  checks: z.object({
    database: serviceCheckSchema,
    objectStore: serviceCheckSchema,
    mail: serviceCheckSchema,
  }),
});
export type Health = z.infer<typeof healthSchema>;
