import { Router } from 'express';
import { studioListQuerySchema, type StudioList } from '@vatside/contracts/studios';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { listStudios } from '../services/studios.ts';

export function studiosRouter({ database }: AppDeps): Router {
  const router = Router();
  router.get('/studios', async (req, res) => {
    const { limit } = parseInput(studioListQuerySchema, req.query, 'query');
    const body: StudioList = { studios: await listStudios(database.db, limit) };
    res.json(body);
  });
  return router;
}
