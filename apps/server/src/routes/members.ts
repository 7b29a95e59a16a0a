import { Router } from 'express';
import { z } from 'zod';
import { invitationCreateSchema, roleChangeSchema } from '@vatside/contracts/members';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { invitationMail } from '../mail/auth-mails.ts';
import { HttpError } from '../http/errors.ts';
import {
  acceptInvitation,
  createInvitation,
  deleteInvitation,
  listInvitations,
  previewInvitation,
  revokeInvitation,
} from '../services/invitations.ts';
import { changeRole, listMembers, removeMember } from '../services/memberships.ts';

const invitationIdSchema = z.object({ invitationId: z.string().uuid() });
const tokenSchema = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/) });

export function membersRouter({ database, mailer, config, notifier }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/studios/:slug/members', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'members:read');
    res.json({ members: await listMembers(db, studio.id) });
  });

  router.patch('/studios/:slug/members/:userId', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'members:manage');
    const { role } = parseInput(roleChangeSchema, req.body, 'role change');
    await changeRole(db, studio.id, req.params.userId, role);
    notifier.membersChanged(studio);
    res.json({ members: await listMembers(db, studio.id) });
  });

  router.delete('/studios/:slug/members/:userId', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'members:manage');
    await removeMember(db, studio.id, req.params.userId);
    notifier.membersChanged(studio);
    res.json({ members: await listMembers(db, studio.id) });
  });

  router.get('/studios/:slug/invitations', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'invitations:manage');
    res.json({ invitations: await listInvitations(db, studio.id) });
  });

  router.post('/studios/:slug/invitations', async (req, res) => {
    const { studio, user } = await authorizeStudio(db, req, req.params.slug, 'invitations:manage');
    const { email } = parseInput(invitationCreateSchema, req.body, 'invitation');
    const host = requireUser(req);
    const { invitation, token } = await createInvitation(db, studio.id, email, host.id);
    const link = `${config.PUBLIC_ORIGIN}/console/join/${token}`;
    try {
      await mailer.send(invitationMail(email, studio.name, user?.name ?? 'A host', link));
    } catch (error) {
      // An invitation nobody received must not linger as "waiting".
      await deleteInvitation(db, invitation.id);
      req.log.error({ err: error }, 'invitation mail failed');
      throw new HttpError(
        502,
        'MAIL_UNAVAILABLE',
        'The invitation e-mail could not be sent; nothing was saved. Try again.',
      );
    }
    res.status(201).json(invitation);
  });

  router.delete('/studios/:slug/invitations/:invitationId', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'invitations:manage');
    const { invitationId } = parseInput(invitationIdSchema, req.params, 'invitation id');
    await revokeInvitation(db, studio.id, invitationId);
    res.status(204).end();
  });

  router.get('/invitations/:token', async (req, res) => {
    const { token } = parseInput(tokenSchema, req.params, 'invitation link');
    res.json(await previewInvitation(db, token));
  });

  router.post('/invitations/:token/accept', async (req, res) => {
    const person = requireUser(req);
    const { token } = parseInput(tokenSchema, req.params, 'invitation link');
    const accepted = await acceptInvitation(db, token, person);
    notifier.membersChanged({ id: accepted.studioId, slug: accepted.studioSlug });
    res.json({ studioSlug: accepted.studioSlug });
  });

  return router;
}
