import { Router } from 'express';
import { unsubscribeQuerySchema } from '@vatside/contracts/mail-unsubscribe';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { describeUnsubscribe, unsubscribe } from '../services/mail-unsubscribe.ts';

/**
 * One-click unsubscribe (RFC 8058). Mail programs POST here from the List-Unsubscribe header;
 * the viewer's /unsubscribe page GETs to show what the link is for, then POSTs. No sign-in: the
 * signed token is the permission.
 */
export function mailUnsubscribeRouter({ database, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/mail/unsubscribe', async (req, res) => {
    const { token } = parseInput(unsubscribeQuerySchema, req.query, 'link');
    res.json(await describeUnsubscribe(db, config.BETTER_AUTH_SECRET, token));
  });

  // The body ("List-Unsubscribe=One-Click", form-encoded) carries nothing we need.
  router.post('/mail/unsubscribe', async (req, res) => {
    const { token } = parseInput(unsubscribeQuerySchema, req.query, 'link');
    res.json(await unsubscribe(db, config.BETTER_AUTH_SECRET, token));
  });

  return router;
}
