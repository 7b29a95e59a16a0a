import { Router } from 'express';
import { pageQuerySchema } from '@vatside/contracts/workbench-common';
import {
  baseCreateSchema,
  baseUpdateSchema,
  potCreateSchema,
  potUpdateSchema,
} from '@vatside/contracts/workbench-bases';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  createBase,
  createPot,
  deleteBase,
  deletePot,
  getBase,
  getPot,
  listBases,
  listPots,
  updateBase,
  updatePot,
} from '../services/workbench-bases.ts';
import { idParam, workbenchEditor, workbenchReader } from './workbench-access.ts';

/** Yarn bases and dye pots. Moderators read; the host edits. */
export function workbenchBasesRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/studios/:slug/bases', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await listBases(db, studio.id, parseInput(pageQuerySchema, req.query, 'query')));
  });

  router.post('/studios/:slug/bases', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const input = parseInput(baseCreateSchema, req.body, 'base');
    res.status(201).json(await createBase(db, studio.id, input));
  });

  router.get('/studios/:slug/bases/:baseId', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await getBase(db, studio.id, idParam(req, 'baseId')));
  });

  router.patch('/studios/:slug/bases/:baseId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const baseId = idParam(req, 'baseId');
    const patch = parseInput(baseUpdateSchema, req.body, 'base');
    res.json(await updateBase(db, studio.id, baseId, patch));
  });

  router.delete('/studios/:slug/bases/:baseId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deleteBase(db, studio.id, idParam(req, 'baseId'));
    res.status(204).end();
  });

  router.get('/studios/:slug/pots', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await listPots(db, studio.id, parseInput(pageQuerySchema, req.query, 'query')));
  });

  router.post('/studios/:slug/pots', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const input = parseInput(potCreateSchema, req.body, 'pot');
    res.status(201).json(await createPot(db, studio.id, input));
  });

  router.get('/studios/:slug/pots/:potId', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await getPot(db, studio.id, idParam(req, 'potId')));
  });

  router.patch('/studios/:slug/pots/:potId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const potId = idParam(req, 'potId');
    const patch = parseInput(potUpdateSchema, req.body, 'pot');
    res.json(await updatePot(db, studio.id, potId, patch));
  });

  router.delete('/studios/:slug/pots/:potId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deletePot(db, studio.id, idParam(req, 'potId'));
    res.status(204).end();
  });

  return router;
}
