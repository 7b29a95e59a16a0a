import { Router } from 'express';
import { pageQuerySchema } from '@vatside/contracts/workbench-common';
import {
  dyeCreateSchema,
  dyeUpdateSchema,
  stockAdjustmentCreateSchema,
  stockSolutionCreateSchema,
  stockSolutionUpdateSchema,
} from '@vatside/contracts/workbench-shelf';
import { requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  adjustStockSolution,
  createDye,
  createStockSolution,
  deleteDye,
  deleteStockSolution,
  getDye,
  getStockSolution,
  listDyes,
  listStockSolutions,
  updateDye,
  updateStockSolution,
} from '../services/workbench-shelf.ts';
import { idParam, workbenchEditor, workbenchReader } from './workbench-access.ts';

/** The dye shelf: dyes and stock solutions. Moderators read; the host edits. */
export function workbenchShelfRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();

  router.get('/studios/:slug/dyes', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await listDyes(db, studio.id, parseInput(pageQuerySchema, req.query, 'query')));
  });

  router.post('/studios/:slug/dyes', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const input = parseInput(dyeCreateSchema, req.body, 'dye');
    res.status(201).json(await createDye(db, studio.id, input));
  });

  router.get('/studios/:slug/dyes/:dyeId', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await getDye(db, studio.id, idParam(req, 'dyeId')));
  });

  router.patch('/studios/:slug/dyes/:dyeId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const dyeId = idParam(req, 'dyeId');
    const patch = parseInput(dyeUpdateSchema, req.body, 'dye');
    res.json(await updateDye(db, studio.id, dyeId, patch));
  });

  router.delete('/studios/:slug/dyes/:dyeId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deleteDye(db, studio.id, idParam(req, 'dyeId'));
    res.status(204).end();
  });

  router.get('/studios/:slug/stock-solutions', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    const page = parseInput(pageQuerySchema, req.query, 'query');
    res.json(await listStockSolutions(db, studio.id, page));
  });

  router.post('/studios/:slug/stock-solutions', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const input = parseInput(stockSolutionCreateSchema, req.body, 'stock solution');
    res.status(201).json(await createStockSolution(db, studio.id, input));
  });

  router.get('/studios/:slug/stock-solutions/:stockId', async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await getStockSolution(db, studio.id, idParam(req, 'stockId')));
  });

  router.patch('/studios/:slug/stock-solutions/:stockId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const stockId = idParam(req, 'stockId');
    const patch = parseInput(stockSolutionUpdateSchema, req.body, 'stock solution');
    res.json(await updateStockSolution(db, studio.id, stockId, patch));
  });

  router.delete('/studios/:slug/stock-solutions/:stockId', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deleteStockSolution(db, studio.id, idParam(req, 'stockId'));
    res.status(204).end();
  });

  router.post('/studios/:slug/stock-solutions/:stockId/adjustments', async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const host = requireUser(req);
    const stockId = idParam(req, 'stockId');
    const input = parseInput(stockAdjustmentCreateSchema, req.body, 'adjustment');
    res.status(201).json(await adjustStockSolution(db, studio.id, stockId, host.id, input));
  });

  return router;
}
