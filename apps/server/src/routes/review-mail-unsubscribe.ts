import { Router } from 'express';
import { unsubscribeQuerySchema } from '@vatside/contracts/mail-unsubscribe';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  describeReviewUnsubscribe,
  reviewUnsubscribe,
} from '../services/review-mail-unsubscribe.ts';

/**
 * One-click stop for review e-mails (RFC 8058): mail programs POST here from List-Unsubscribe;
 * the viewer's page GETs to show what the link is for, then POSTs. The signed token is the
 * permission, so no sign-in.
 */
export function reviewMailUnsubscribeRouter({ database, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/mail/review-unsubscribe', async (req, res) => {
    const { token } = parseInput(unsubscribeQuerySchema, req.query, 'link');
    res.json(await describeReviewUnsubscribe(db, config.BETTER_AUTH_SECRET, token));
  });

  router.post('/mail/review-unsubscribe', async (req, res) => {
    const { token } = parseInput(unsubscribeQuerySchema, req.query, 'link');
    res.json(await reviewUnsubscribe(db, config.BETTER_AUTH_SECRET, token));
  });

  return router;
}
