import { Router } from 'express';
import { pageQuerySchema } from '@vatside/contracts/workbench-common';
import {
  amountsQuerySchema,
  colorwayCreateSchema,
  colorwayDetailQuerySchema,
  colorwayUpdateSchema,
  stepCreateSchema,
  stepOrderSchema,
  stepUpdateSchema,
} from '@vatside/contracts/workbench-colorways';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  colorwayOrThrow,
  computeAmounts,
  createColorway,
  deleteColorway,
  getColorway,
  listColorways,
  updateColorway,
} from '../services/workbench-colorways.ts';
import {
  createStep,
  deleteStep,
  listSteps,
  reorderSteps,
  updateStep,
} from '../services/workbench-steps.ts';
import { idParam, measureSystem, workbenchEditor, workbenchReader } from './workbench-access.ts';

/** Colorways with dye-kit's amounts, and their run sheets. Moderators read; the host edits. */
export function workbenchColorwaysRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const base = '/studios/:slug/colorways';

  router.get(base, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    const page = parseInput(pageQuerySchema, req.query, 'query');
    res.json(await listColorways(db, studio.id, page));
  });

  router.post(base, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const input = parseInput(colorwayCreateSchema, req.body, 'colorway');
    res.status(201).json(await createColorway(db, studio.id, input));
  });

  router.get(`${base}/:colorwayId`, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const { system } = parseInput(colorwayDetailQuerySchema, req.query, 'query');
    res.json(await getColorway(db, studio.id, colorwayId, measureSystem(req, system)));
  });

  router.patch(`${base}/:colorwayId`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const patch = parseInput(colorwayUpdateSchema, req.body, 'colorway');
    res.json(await updateColorway(db, studio.id, colorwayId, patch));
  });

  router.delete(`${base}/:colorwayId`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deleteColorway(db, studio.id, idParam(req, 'colorwayId'));
    res.status(204).end();
  });

  // A preview for any skein: ?weightOfGoodsG=115 or ?skeins=3, optional potCapacityMl and system.
  router.get(`${base}/:colorwayId/amounts`, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const query = parseInput(amountsQuerySchema, req.query, 'query');
    const row = await colorwayOrThrow(db, studio.id, colorwayId);
    const target =
      query.skeins !== undefined
        ? { skeins: query.skeins }
        : { weightOfGoodsG: query.weightOfGoodsG ?? row.weightOfGoodsG };
    const options = {
      system: measureSystem(req, query.system),
      ...(query.potCapacityMl !== undefined ? { potCapacityMl: query.potCapacityMl } : {}),
    };
    res.json(await computeAmounts(db, row, target, options));
  });

  router.get(`${base}/:colorwayId/steps`, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await listSteps(db, studio.id, idParam(req, 'colorwayId')));
  });

  router.post(`${base}/:colorwayId/steps`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const input = parseInput(stepCreateSchema, req.body, 'step');
    res.status(201).json(await createStep(db, studio.id, colorwayId, input));
  });

  router.put(`${base}/:colorwayId/steps/order`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const order = parseInput(stepOrderSchema, req.body, 'step order');
    res.json(await reorderSteps(db, studio.id, colorwayId, order));
  });

  router.patch(`${base}/:colorwayId/steps/:stepId`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    const stepId = idParam(req, 'stepId');
    const patch = parseInput(stepUpdateSchema, req.body, 'step');
    res.json(await updateStep(db, studio.id, colorwayId, stepId, patch));
  });

  router.delete(`${base}/:colorwayId/steps/:stepId`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const colorwayId = idParam(req, 'colorwayId');
    res.json(await deleteStep(db, studio.id, colorwayId, idParam(req, 'stepId')));
  });

  return router;
}
