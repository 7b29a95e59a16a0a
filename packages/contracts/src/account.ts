import { z } from 'zod';
import { studioRoleSchema } from './roles.ts';
import { studioSummarySchema } from './studios.ts';

export const unitSystemSchema = z.enum(['us', 'metric']);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

/** An IANA time zone the runtime knows, e.g. "America/Halifax" or "UTC". */
export const timeZoneSchema = z.string().refine(
  (zone) => {
    try {
      new Intl.DateTimeFormat('en-US', { timeZone: zone });
      return true;
    } catch {
      return false;
    }
  },
  { message: 'Unknown time zone' },
);

export const profileSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  emailVerified: z.boolean(),
  timeZone: z.string(),
  unitSystem: unitSystemSchema,
  defaultSkeinWeightG: z.number().int(),
});
export type Profile = z.infer<typeof profileSchema>;

/** PATCH /api/me/profile: any subset of the editable fields. */
export const profileUpdateSchema = z
  .object({
    name: z.string().trim().min(1).max(80),
    timeZone: timeZoneSchema,
    unitSystem: unitSystemSchema,
    // A skein is rarely under 10 g or over 1 kg; the bound keeps typos out.
    defaultSkeinWeightG: z.number().int().min(5).max(2000),
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Send at least one field to change.' });
export type ProfileUpdate = z.infer<typeof profileUpdateSchema>;

export const membershipSchema = z.object({
  studio: studioSummarySchema,
  role: studioRoleSchema,
  mailOptIn: z.boolean(),
});
export type Membership = z.infer<typeof membershipSchema>;

export const meSchema = z.object({
  profile: profileSchema,
  memberships: z.array(membershipSchema),
});
export type Me = z.infer<typeof meSchema>;

/** GET /api/me: the signed-in person, or null for a visitor (an answer, not an error). */
export const meOrVisitorSchema = meSchema.nullable();
