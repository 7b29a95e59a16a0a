import { Router } from 'express';
import { z } from 'zod';
import { authorizeStudio } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { dyeAlongDyeLog, sessionDyeLog } from '../live/dye-log.ts';
import { requireSessionRole, sessionAccess } from '../live/session-access.ts';

const sessionParams = z.object({ sessionId: z.uuid() });
const dyeAlongParams = z.object({ dyeAlongId: z.uuid() });

/** The dye log for the host and moderators: a session's entries, and the month's plan vs actual. */
export function dyeLogRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/live-sessions/:sessionId/dye-log', async (req, res) => {
    const { sessionId } = parseInput(sessionParams, req.params, 'session id');
    const access = await sessionAccess(db, sessionId, req.user?.id);
    requireSessionRole(access, 'live:logRead');
    res.json(await sessionDyeLog(db, access.row));
  });

  router.get('/studios/:slug/dye-alongs/:dyeAlongId/dye-log', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'live:logRead');
    const { dyeAlongId } = parseInput(dyeAlongParams, req.params, 'dye-along id');
    res.json(await dyeAlongDyeLog(db, studio.id, dyeAlongId));
  });

  return router;
}
