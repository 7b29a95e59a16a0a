import { Router, type Request } from 'express';
import { galleryQuerySchema, recapUpdateSchema } from '@vatside/contracts/gallery';
import { authorizeStudio } from '../auth/authorize.ts';
import type { StudioAction } from '../auth/policy.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { visibleDyeAlongRow } from '../services/dye-alongs.ts';
import {
  gallery,
  gallerySkein,
  getRecap,
  monthColorwayPhoto,
  setRecap,
} from '../services/gallery.ts';
import { idParam } from './workbench-access.ts';

/**
 * The month's gallery (anyone, visitors too: approved and featured skeins only) and the recap
 * running order (moderators read it, the host builds it).
 */
export function galleryRouter({ database, objectStore }: AppDeps): Router {
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

  router.get(`${one}/gallery/:submissionId`, async (req, res) => {
    const { studio, dyeAlongId } = await dyeAlongFor(req, 'studio:read');
    res.json(await gallerySkein(db, studio, dyeAlongId, idParam(req, 'submissionId')));
  });

  // The host's own photo of one of the month's colorways, for the gallery's studio strip.
  for (const which of ['web', 'thumb'] as const) {
    router.get(`${one}/colorways/:colorwayId/photos/:imageId/${which}`, async (req, res) => {
      const { dyeAlongId } = await dyeAlongFor(req, 'studio:read');
      const { key, contentType } = await monthColorwayPhoto(
        db,
        dyeAlongId,
        idParam(req, 'colorwayId'),
        idParam(req, 'imageId'),
        which,
      );
      res.set({
        'Content-Type': contentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': 'inline',
        // The image id is in the address, so a new photo gets a new address.
        'Cache-Control': 'public, max-age=300',
      });
      res.send(Buffer.from(await objectStore.getBytes(key)));
    });
  }

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
