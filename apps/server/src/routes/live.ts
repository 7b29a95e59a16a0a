import { Router } from 'express';
import { z } from 'zod';
import { currentLiveSchema } from '@vatside/contracts/live-now';
import { liveSessionStartSchema } from '@vatside/contracts/live-program';
import { authorizeStudio, requireUser, studioStanding } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { HttpError } from '../http/errors.ts';
import { parseInput } from '../http/validate.ts';
import {
  liveSessionRow,
  runningLiveSession,
  sessionProgram,
  startLiveSession,
} from '../live/sessions.ts';

const dyeAlongParams = z.object({ dyeAlongId: z.string().uuid() });
const sessionParams = z.object({ sessionId: z.string().uuid() });

export function liveRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.post('/studios/:slug/dye-alongs/:dyeAlongId/live-sessions', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'live:run');
    const host = requireUser(req);
    const { dyeAlongId } = parseInput(dyeAlongParams, req.params, 'dye-along id');
    const { mode } = parseInput(liveSessionStartSchema, req.body, 'live session');
    const { sessionId } = await startLiveSession(db, studio, dyeAlongId, mode, host.id);
    res.status(201).json({ sessionId, viewerPath: `/live/${sessionId}` });
  });

  router.get('/studios/:slug/live', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'studio:read');
    res.json(currentLiveSchema.parse({ live: await runningLiveSession(db, studio.id) }));
  });

  router.get('/live-sessions/:sessionId/program', async (req, res) => {
    const { sessionId } = parseInput(sessionParams, req.params, 'session id');
    const row = await liveSessionRow(db, sessionId);
    // A rehearsal is private: to anyone but the studio's host it does not exist.
    if (
      row.mode === 'rehearsal' &&
      (await studioStanding(db, row.studioId, req.user?.id)) !== 'host'
    ) {
      throw new HttpError(404, 'NOT_FOUND', 'That live session was not found.');
    }
    res.json(sessionProgram(row));
  });

  return router;
}
