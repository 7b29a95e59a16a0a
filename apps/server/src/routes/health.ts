import { Router } from 'express';
import type { AppDeps } from '../deps.ts';
import { checkHealth } from '../services/health.ts';

export function healthRouter(deps: AppDeps): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const health = await checkHealth(deps);
    res.status(health.status === 'ok' ? 200 : 503).json(health);
  });
  return router;
}
