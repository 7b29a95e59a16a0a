import { Router, type Request } from 'express';
import { galleryQuerySchema, recapUpdateSchema } from '@vatside/contracts/gallery';
import { authorizeStudio } from '../auth/authorize.ts';
import type { StudioAction } from '../auth/policy.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { visibleDyeAlongRow } from '../services/dye-alongs.ts';
import { gallery, getRecap, setRecap } from '../services/gallery.ts';
import { idParam } from './workbench-access.ts';

/**
 * The month's gallery (anyone, visitors too: approved and featured skeins only) and the recap
 * running order (moderators read it, the host builds it).
 */
export function galleryRouter({ database }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const one = '/studios/:slug/dye-alongs/:dyeAlongId';

  /** The role check, then the dye-along in this studio (a draft is "not found" here). */
  async function dyeAlongFor(req: Request<{ slug: string }>, action: StudioAction) {
    const { studio } = await authorizeStudio(db, req, req.params.slug, action);
    const row = await visibleDyeAlongRow(db, studio.id, idParam(req, 'dyeAlongId'), false);
    return { studio, dyeAlongId: row.id };
  }

  router.get(`${one}/gallery`, async (req, res) => {
    const { studio, dyeAlongId } = await dyeAlongFor(req, 'studio:read');
    const query = parseInput(galleryQuerySchema, req.query, 'query');
    res.json(await gallery(db, studio, dyeAlongId, query));
  });

  router.get(`${one}/recap`, async (req, res) => {
    const { studio, dyeAlongId } = await dyeAlongFor(req, 'recap:read');
    res.json(await getRecap(db, studio, dyeAlongId));
  });

  router.put(`${one}/recap`, async (req, res) => {
    const { studio, dyeAlongId } = await dyeAlongFor(req, 'recap:edit');
    const input = parseInput(recapUpdateSchema, req.body, 'running order');
    res.json(await setRecap(db, studio, dyeAlongId, input));
  });

  return router;
}
