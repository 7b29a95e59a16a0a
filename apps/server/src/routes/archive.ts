import { Router } from 'express';
import {
  archiveSearchQuerySchema,
  bathRecordInputSchema,
  dyeAgainQuerySchema,
} from '@vatside/contracts/archive';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { listBathRecords, saveBathRecord } from '../services/archive-records.ts';
import { archivedColorwayDetail, dyeAgain, searchArchive } from '../services/archive.ts';
import { idParam, measureSystem } from './workbench-access.ts';

/** Bath records of a month, the archive of finished colorways, and dye again. */
export function archiveRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const records = '/studios/:slug/dye-alongs/:dyeAlongId/bath-records';
  const archive = '/studios/:slug/archive';

  router.get(records, async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'archive:read');
    res.json(await listBathRecords(db, studio.id, idParam(req, 'dyeAlongId')));
  });

  router.put(`${records}/:colorwayId`, async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'archive:edit');
    const dyeAlongId = idParam(req, 'dyeAlongId');
    const colorwayId = idParam(req, 'colorwayId');
    const input = parseInput(bathRecordInputSchema, req.body, 'bath record');
    res.json(
      await saveBathRecord(db, studio.id, dyeAlongId, colorwayId, input, requireUser(req).id),
    );
  });

  router.get(archive, async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'archive:read');
    const query = parseInput(archiveSearchQuerySchema, req.query, 'query');
    res.json(await searchArchive(db, studio.id, query));
  });

  router.get(`${archive}/:archivedColorwayId`, async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'archive:read');
    res.json(await archivedColorwayDetail(db, studio, idParam(req, 'archivedColorwayId')));
  });

  router.get(`${archive}/:archivedColorwayId/dye-again`, async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'archive:read');
    const id = idParam(req, 'archivedColorwayId');
    const query = parseInput(dyeAgainQuerySchema, req.query, 'query');
    res.json(await dyeAgain(db, studio, id, query, measureSystem(req, query.system)));
  });

  return router;
}
