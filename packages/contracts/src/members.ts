import { z } from 'zod';
import { studioRoleSchema } from './roles.ts';
import { studioSummarySchema } from './studios.ts';

export const memberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: studioRoleSchema,
  mailOptIn: z.boolean(),
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

/** GET /api/studios/:slug/members */
export const memberListSchema = z.object({ members: z.array(memberSchema) });

/** PATCH /api/studios/:slug/members/:userId */
export const roleChangeSchema = z.object({ role: studioRoleSchema });
export type RoleChange = z.infer<typeof roleChangeSchema>;

export const invitationStatusSchema = z.enum(['waiting', 'accepted', 'revoked', 'expired']);
export type InvitationStatus = z.infer<typeof invitationStatusSchema>;

export const invitationSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  role: studioRoleSchema,
  status: invitationStatusSchema,
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /api/studios/:slug/invitations */
export const invitationListSchema = z.object({ invitations: z.array(invitationSchema) });

/** POST /api/studios/:slug/invitations: hosts invite moderators by e-mail. */
export const invitationCreateSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email()),
});
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;

/** GET /api/invitations/:token: what an invitation link offers, readable before signing in. */
export const invitationPreviewSchema = z.object({
  studio: studioSummarySchema,
  role: studioRoleSchema,
  email: z.string(),
  status: invitationStatusSchema,
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
