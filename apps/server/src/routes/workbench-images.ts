import { Router } from 'express';
import {
  imageListQuerySchema,
  imageUploadFieldsSchema,
  paletteEditSchema,
  palettePickSchema,
} from '@vatside/contracts/workbench-images';
import { requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import {
  checkImageTarget,
  createImage,
  deleteImage,
  editPalette,
  getImage,
  listImages,
  pickSwatch,
  renditionOf,
} from '../services/workbench-images.ts';
import { processImage } from '../uploads/process-image.ts';
import { imageUploadParser, receiveImage } from '../uploads/receive-upload.ts';
import { idParam, workbenchEditor, workbenchReader } from './workbench-access.ts';

/** Renditions never change under a key, so browsers may keep them a while (private: role-checked). */
const RENDITION_CACHE = 'private, max-age=3600';

/**
 * Inspiration images and colorway photos. Renditions are served here rather than by signed URLs:
 * the role is checked on every request (a removed moderator loses access at once), the type
 * comes from our record, and the object store never needs to be reachable from browsers.
 */
export function workbenchImagesRouter({ database, objectStore, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  const base = '/studios/:slug/images';
  const parser = imageUploadParser(config.UPLOAD_MAX_BYTES);

  router.get(base, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await listImages(db, studio, parseInput(imageListQuerySchema, req.query, 'query')));
  });

  // The role is checked before multer reads a byte of the body.
  router.post(base, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const host = requireUser(req);
    const file = await receiveImage(parser, config.UPLOAD_MAX_BYTES, req, res);
    const fields = parseInput(imageUploadFieldsSchema, req.body, 'upload');
    await checkImageTarget(db, studio.id, fields.colorwayId);
    const processed = await processImage(file.buffer, {
      maxPixels: config.UPLOAD_MAX_PIXELS,
      swatchCount: fields.swatchCount,
    });
    const image = await createImage(db, objectStore, studio, {
      purpose: fields.purpose,
      colorwayId: fields.colorwayId,
      uploadedBy: host.id,
      processed,
    });
    res.status(201).json(image);
  });

  router.get(`${base}/:imageId`, async (req, res) => {
    const { studio } = await workbenchReader(db, req);
    res.json(await getImage(db, studio, idParam(req, 'imageId')));
  });

  router.delete(`${base}/:imageId`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    await deleteImage(db, objectStore, studio.id, idParam(req, 'imageId'));
    res.status(204).end();
  });

  for (const which of ['web', 'thumb'] as const) {
    router.get(`${base}/:imageId/${which}`, async (req, res) => {
      const { studio } = await workbenchReader(db, req);
      const imageId = idParam(req, 'imageId');
      const { key, contentType } = await renditionOf(db, studio.id, imageId, which);
      // Keys are random and never reused, so the key itself is the entity tag.
      const etag = `"${key.replaceAll('/', '-')}"`;
      res.set({
        'Content-Type': contentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': 'inline',
        'Cache-Control': RENDITION_CACHE,
        ETag: etag,
      });
      if (req.get('if-none-match') === etag) {
        res.status(304).end();
        return;
      }
      res.send(Buffer.from(await objectStore.getBytes(key)));
    });
  }

  router.put(`${base}/:imageId/palette`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const imageId = idParam(req, 'imageId');
    const edit = parseInput(paletteEditSchema, req.body, 'palette');
    res.json(await editPalette(db, studio, imageId, edit));
  });

  router.post(`${base}/:imageId/palette/pick`, async (req, res) => {
    const { studio } = await workbenchEditor(db, req);
    const imageId = idParam(req, 'imageId');
    const pick = parseInput(palettePickSchema, req.body, 'point');
    res.status(201).json(await pickSwatch(db, objectStore, studio, imageId, pick));
  });

  return router;
}
