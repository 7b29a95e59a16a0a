import { Router, type Request } from 'express';
import {
  auditQuerySchema,
  bulkDecisionSchema,
  reviewDecisionSchema,
  reviewQueueQuerySchema,
} from '@vatside/contracts/review';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  auditLog,
  decideMany,
  decideOne,
  reviewQueue,
  reviewSubmission,
} from '../services/review.ts';
import { idParam } from './workbench-access.ts';

/** The review queue: moderators and the host decide; every decision lands in the audit. */
export function reviewRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const base = '/studios/:slug/review';

  async function reviewer(req: Request<{ slug: string }>) {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'review:work');
    return { studio, userId: requireUser(req).id };
  }

  router.get(`${base}/submissions`, async (req, res) => {
    const { studio } = await reviewer(req);
    res.json(await reviewQueue(db, studio, parseInput(reviewQueueQuerySchema, req.query, 'query')));
  });

  router.get(`${base}/submissions/:submissionId`, async (req, res) => {
    const { studio } = await reviewer(req);
    res.json(await reviewSubmission(db, studio, idParam(req, 'submissionId')));
  });

  router.post(`${base}/submissions/:submissionId/decisions`, async (req, res) => {
    const { studio, userId } = await reviewer(req);
    const id = idParam(req, 'submissionId');
    const decision = parseInput(reviewDecisionSchema, req.body, 'decision');
    res.json(await decideOne(db, studio, userId, id, decision));
  });

  router.post(`${base}/decisions`, async (req, res) => {
    const { studio, userId } = await reviewer(req);
    const input = parseInput(bulkDecisionSchema, req.body, 'decision');
    res.json(await decideMany(db, studio, userId, input));
  });

  router.get(`${base}/audit`, async (req, res) => {
    const { studio } = await reviewer(req);
    res.json(await auditLog(db, studio, parseInput(auditQuerySchema, req.query, 'query')));
  });

  return router;
}
