import { Router, type Request } from 'express';
import { eq } from '@vatside/db/sql';
import { supplyListQuerySchema } from '@vatside/contracts/dye-along-supplies';
import {
  dyeAlongCreateSchema,
  dyeAlongListQuerySchema,
  dyeAlongTransitionSchema,
  dyeAlongUpdateSchema,
  publicDyeAlongQuerySchema,
  viewerPaths,
} from '@vatside/contracts/dye-alongs';
import { images } from '@vatside/db/schema';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import { can } from '../auth/policy.ts';
import type { AppDeps } from '../deps.ts';
import { notFound } from '../http/errors.ts';
import { parseInput } from '../http/validate.ts';
import { dyeAlongCalendar } from '../mail/dye-along-calendar.ts';
import { isPublic } from '../services/dye-along-rules.ts';
import { dyeAlongSupplies, publicDyeAlong } from '../services/dye-along-view.ts';
import {
  createDyeAlong,
  deleteDyeAlong,
  getDyeAlong,
  listDyeAlongs,
  transitionDyeAlong,
  updateDyeAlong,
  visibleDyeAlongRow,
} from '../services/dye-alongs.ts';
import { idParam, measureSystem } from './workbench-access.ts';

/** Renditions never change under a key; public, but short so a withdrawn one fades quickly. */
const PUBLIC_IMAGE_CACHE = 'public, max-age=300';

/**
 * Dye-alongs. The host plans and moves them on; moderators read everything; from announced on,
 * anyone (visitors too) reads the public page, supplies, calendar file and inspiration image.
 */
export function dyeAlongsRouter({ database, objectStore, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const base = '/studios/:slug/dye-alongs';
  const one = `${base}/:dyeAlongId`;

  const staffOnly = (req: Request<{ slug: string }>) =>
    authorizeStudio(db, req, req.params.slug, 'dyeAlong:read');
  const hostOnly = (req: Request<{ slug: string }>) =>
    authorizeStudio(db, req, req.params.slug, 'dyeAlong:edit');
  /** Anyone may ask; a draft answers 404 unless the asker may see drafts. */
  async function readable(req: Request<{ slug: string }>) {
    const access = await authorizeStudio(db, req, req.params.slug, 'studio:read');
    const seesDrafts = can(access.standing, 'dyeAlong:read');
    const row = await visibleDyeAlongRow(
      db,
      access.studio.id,
      idParam(req, 'dyeAlongId'),
      seesDrafts,
    );
    return { ...access, row };
  }

  router.get(base, async (req, res) => {
    const { studio, standing } = await authorizeStudio(db, req, req.params.slug, 'studio:read');
    const query = parseInput(dyeAlongListQuerySchema, req.query, 'query');
    res.json(await listDyeAlongs(db, studio.id, can(standing, 'dyeAlong:read'), query));
  });

  router.post(base, async (req, res) => {
    const { studio } = await hostOnly(req);
    const host = requireUser(req);
    const input = parseInput(dyeAlongCreateSchema, req.body, 'dye-along');
    res.status(201).json(await createDyeAlong(db, studio.id, host.id, input));
  });

  router.get(one, async (req, res) => {
    const { studio } = await staffOnly(req);
    res.json(await getDyeAlong(db, studio.id, idParam(req, 'dyeAlongId')));
  });

  router.patch(one, async (req, res) => {
    const { studio } = await hostOnly(req);
    const id = idParam(req, 'dyeAlongId');
    const patch = parseInput(dyeAlongUpdateSchema, req.body, 'dye-along');
    res.json(await updateDyeAlong(db, studio.id, id, patch));
  });

  router.delete(one, async (req, res) => {
    const { studio } = await hostOnly(req);
    await deleteDyeAlong(db, studio.id, idParam(req, 'dyeAlongId'));
    res.status(204).end();
  });

  router.post(`${one}/transitions`, async (req, res) => {
    const { studio } = await hostOnly(req);
    const id = idParam(req, 'dyeAlongId');
    const { to } = parseInput(dyeAlongTransitionSchema, req.body, 'status change');
    res.json(await transitionDyeAlong(db, studio.id, id, to));
  });

  // The viewer's page: ?weightOfGoodsG=50&system=us&timeZone=Europe/Berlin, else the profile's.
  router.get(`${one}/public`, async (req, res) => {
    const { studio, user, row } = await readable(req);
    const query = parseInput(publicDyeAlongQuerySchema, req.query, 'query');
    res.json(
      await publicDyeAlong(db, { slug: studio.slug, name: studio.name }, row, {
        weightOfGoodsG: query.weightOfGoodsG ?? user?.defaultSkeinWeightG ?? 100,
        system: measureSystem(req, query.system),
        timeZone: query.timeZone ?? user?.timeZone ?? row.timeZone,
      }),
    );
  });

  // The host's batch (?scope=hostBatch) or one skein of each colorway (?scope=perSkein).
  router.get(`${one}/supply-list`, async (req, res) => {
    const { user, row } = await readable(req);
    const query = parseInput(supplyListQuerySchema, req.query, 'query');
    const target =
      query.scope === 'hostBatch'
        ? { scope: 'hostBatch' as const }
        : {
            scope: 'perSkein' as const,
            weightOfGoodsG: query.weightOfGoodsG ?? user?.defaultSkeinWeightG ?? 100,
          };
    res.json(await dyeAlongSupplies(db, row, target, measureSystem(req, query.system)));
  });

  router.get(`${one}/calendar.ics`, async (req, res) => {
    const { studio, row } = await readable(req);
    const origin = config.PUBLIC_ORIGIN;
    const calendar = dyeAlongCalendar({
      dyeAlongId: row.id,
      title: row.title,
      studioName: studio.name,
      startsAt: row.startsAt,
      expectedLengthMin: row.expectedLengthMin,
      pageUrl: new URL(viewerPaths.dyeAlong(studio.slug, row.id), origin).href,
      streamUrl: row.streamUrl,
      sequence: Math.floor(row.updatedAt.getTime() / 1000) % 2_000_000_000,
      originHost: new URL(origin).hostname,
    });
    res.set({
      'Content-Type': 'text/calendar; charset=utf-8',
      'Content-Disposition': 'attachment; filename="dye-along.ics"',
      'Cache-Control': 'no-cache',
    });
    res.send(calendar);
  });

  // Serves only the inspiration image of a dye-along that has been announced.
  for (const which of ['web', 'thumb'] as const) {
    router.get(`${one}/inspiration/${which}`, async (req, res) => {
      const { row } = await readable(req);
      if (!isPublic(row.status) || !row.inspirationImageId) throw notFound('That image');
      const [image] = await db.select().from(images).where(eq(images.id, row.inspirationImageId));
      if (!image) throw notFound('That image');
      const key = which === 'web' ? image.webKey : image.thumbKey;
      const etag = `"${key.replaceAll('/', '-')}"`;
      res.set({
        'Content-Type': image.contentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': 'inline',
        'Cache-Control': PUBLIC_IMAGE_CACHE,
        ETag: etag,
      });
      if (req.get('if-none-match') === etag) {
        res.status(304).end();
        return;
      }
      res.send(Buffer.from(await objectStore.getBytes(key)));
    });
  }

  return router;
}
