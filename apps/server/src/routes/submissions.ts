import { Router, type Request } from 'express';
import {
  consentSchema,
  mySubmissionsQuerySchema,
  submissionCreateSchema,
  submissionUpdateSchema,
} from '@vatside/contracts/submissions';
import { authorizeStudio, requireUser } from '../auth/authorize.ts';
import { can } from '../auth/policy.ts';
import type { AppDeps } from '../deps.ts';
import { notFound } from '../http/errors.ts';
import { parseInput } from '../http/validate.ts';
import { isPublicStatus } from '../services/gallery.ts';
import {
  dyeAlongOpenForSharing,
  getMySubmission,
  listMySubmissions,
  setConsent,
  shareSkein,
  submissionPhotoOf,
  updateMySubmission,
  withdrawSubmission,
} from '../services/submissions.ts';
import { checkShareLimits } from '../services/share-limits.ts';
import { receiveSharePhotos, sharePhotosParser } from '../uploads/receive-photos.ts';
import { idParam } from './workbench-access.ts';

/**
 * Sharing a skein and "my skeins". A share is one multipart request: 1–4 files in `photos` and
 * a JSON `details` field; the role and the sharing window are checked before a byte of it is
 * read. Everything under /my-submissions is scoped to the asker: another person's skein is 404.
 */
export function submissionsRouter({ database, objectStore, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const mine = '/studios/:slug/my-submissions';
  const one = `${mine}/:submissionId`;
  const parser = sharePhotosParser(config.UPLOAD_MAX_BYTES);
  const limits = {
    sharesPerHour: config.SHARES_PER_HOUR,
    storageQuotaBytes: config.SHARE_STORAGE_QUOTA_BYTES,
  };

  async function sharer(req: Request<{ slug: string }>) {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'submission:share');
    return { studio, userId: requireUser(req).id };
  }

  router.post('/studios/:slug/dye-alongs/:dyeAlongId/submissions', async (req, res) => {
    const { studio, userId } = await sharer(req);
    const dyeAlong = await dyeAlongOpenForSharing(db, studio.id, idParam(req, 'dyeAlongId'));
    // Before a byte of the photos is read: over the hourly count, or no room left at all.
    await checkShareLimits(db, { studioId: studio.id, sharerId: userId }, limits);
    const { photos, details } = await receiveSharePhotos(parser, config.UPLOAD_MAX_BYTES, req, res);
    const input = parseInput(submissionCreateSchema, details, 'details');
    const created = await shareSkein(db, objectStore, {
      studio,
      dyeAlong,
      sharerId: userId,
      files: photos.map((p) => p.buffer),
      input,
      maxPixels: config.UPLOAD_MAX_PIXELS,
      limits,
    });
    res.status(201).json(created);
  });

  router.get(mine, async (req, res) => {
    const { studio, userId } = await sharer(req);
    const query = parseInput(mySubmissionsQuerySchema, req.query, 'query');
    res.json(await listMySubmissions(db, studio, userId, query));
  });

  router.get(one, async (req, res) => {
    const { studio, userId } = await sharer(req);
    res.json(await getMySubmission(db, studio, userId, idParam(req, 'submissionId')));
  });

  router.patch(one, async (req, res) => {
    const { studio, userId } = await sharer(req);
    const id = idParam(req, 'submissionId');
    const patch = parseInput(submissionUpdateSchema, req.body, 'skein');
    res.json(await updateMySubmission(db, objectStore, studio, userId, id, patch));
  });

  router.put(`${one}/consent`, async (req, res) => {
    const { studio, userId } = await sharer(req);
    const id = idParam(req, 'submissionId');
    const consent = parseInput(consentSchema, req.body, 'consent');
    res.json(await setConsent(db, studio, userId, id, consent));
  });

  router.delete(one, async (req, res) => {
    const { studio, userId } = await sharer(req);
    await withdrawSubmission(db, objectStore, studio, userId, idParam(req, 'submissionId'));
    res.status(204).end();
  });

  // Photos: anyone once approved; before that only the sharer and the staff (others get 404,
  // which says nothing about whether it exists).
  for (const which of ['web', 'thumb'] as const) {
    router.get(
      `/studios/:slug/submissions/:submissionId/photos/:photoId/${which}`,
      async (req, res) => {
        const access = await authorizeStudio(db, req, req.params.slug, 'studio:read');
        const photo = await submissionPhotoOf(
          db,
          access.studio.id,
          idParam(req, 'submissionId'),
          idParam(req, 'photoId'),
          which,
        );
        const isPublic = isPublicStatus(photo.status);
        const maySee =
          isPublic || photo.sharerUserId === access.user?.id || can(access.standing, 'review:work');
        if (!maySee) throw notFound('That photo');
        res.set({
          'Content-Type': photo.contentType,
          'X-Content-Type-Options': 'nosniff',
          'Content-Disposition': 'inline',
          // Short, so a skein taken down fades from caches quickly; private before approval.
          'Cache-Control': isPublic ? 'public, max-age=300' : 'private, no-store',
        });
        res.send(Buffer.from(await objectStore.getBytes(photo.key)));
      },
    );
  }

  return router;
}
