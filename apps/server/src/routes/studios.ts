import { Router } from 'express';
import {
  followSchema,
  studioCreateSchema,
  studioListQuerySchema,
  type StudioList,
} from '@vatside/contracts/studios';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { follow, unfollow } from '../services/memberships.ts';
import { createStudio, listStudios, studioDetail } from '../services/studios.ts';

export function studiosRouter({ database, notifier }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/studios', async (req, res) => {
    const { limit } = parseInput(studioListQuerySchema, req.query, 'query');
    const body: StudioList = { studios: await listStudios(db, limit) };
    res.json(body);
  });

  router.post('/studios', async (req, res) => {
    const host = requireUser(req);
    const input = parseInput(studioCreateSchema, req.body, 'studio');
    res.status(201).json(await createStudio(db, host.id, input));
  });

  router.get('/studios/:slug', async (req, res) => {
    const { studio, standing, user } = await authorizeStudio(
      db,
      req,
      req.params.slug,
      'studio:read',
    );
    res.json(await studioDetail(db, studio, standing, user?.id));
  });

  router.put('/studios/:slug/follow', async (req, res) => {
    const person = requireUser(req);
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'studio:follow');
    const { mailOptIn } = parseInput(followSchema, req.body, 'follow request');
    await follow(db, studio.id, person.id, mailOptIn);
    notifier.membersChanged(studio);
    const { standing } = await authorizeStudio(db, req, req.params.slug, 'studio:read');
    res.json(await studioDetail(db, studio, standing, person.id));
  });

  router.delete('/studios/:slug/follow', async (req, res) => {
    const person = requireUser(req);
    const { studio, standing } = await authorizeStudio(db, req, req.params.slug, 'studio:follow');
    await unfollow(db, studio.id, person.id, standing);
    notifier.membersChanged(studio);
    res.json(await studioDetail(db, studio, 'visitor', person.id));
  });

  return router;
}
