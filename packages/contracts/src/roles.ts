import { z } from 'zod';

/** Roles a person holds in one studio; anyone without one is a visitor. */
export const studioRoles = ['host', 'moderator', 'viewer'] as const;
export const studioRoleSchema = z.enum(studioRoles);
export type StudioRole = z.infer<typeof studioRoleSchema>;
export type StudioStanding = StudioRole | 'visitor';
