import { Router } from 'express';
import { z } from 'zod';
import { questionQueueQuerySchema } from '@vatside/contracts/questions';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { questionViewOf } from '../live/question-hub.ts';
import { questionQueue } from '../live/questions.ts';
import { sessionAccess } from '../live/session-access.ts';

const sessionParams = z.object({ sessionId: z.uuid() });

/** The question queue as the asker's role may see it (staff: all; viewers: visible; visitors: answered). */
export function questionsRouter({ database, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/live-sessions/:sessionId/questions', async (req, res) => {
    const { sessionId } = parseInput(sessionParams, req.params, 'session id');
    const { sort } = parseInput(questionQueueQuerySchema, req.query, 'queue query');
    const access = await sessionAccess(db, sessionId, req.user?.id);
    const limits = {
      minIntervalS: config.QUESTION_MIN_INTERVAL_S,
      perSession: config.QUESTIONS_PER_SESSION,
    };
    res.json(
      await questionQueue(db, sessionId, questionViewOf(access), access.userId, sort, limits),
    );
  });

  return router;
}
