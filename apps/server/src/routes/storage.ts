import { Router } from 'express';
import { authorizeStudio } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { studioStorage } from '../services/storage-use.ts';

/** GET /api/studios/:slug/storage: what the studio keeps in the object store (host only). */
export function storageRouter({ database, config }: AppDeps): Router {
  const { db } = database;
  const router = Router();
  router.get('/studios/:slug/storage', async (req, res) => {
    const { studio } = await authorizeStudio(db, req, req.params.slug, 'storage:read');
    res.json(
      await studioStorage(db, studio.id, {
        sharesPerHour: config.SHARES_PER_HOUR,
        storageQuotaBytes: config.SHARE_STORAGE_QUOTA_BYTES,
      }),
    );
  });
  return router;
}
