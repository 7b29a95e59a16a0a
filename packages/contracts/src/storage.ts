import { z } from 'zod';

// A studio's use of the object store, for its host: workbench images and shared skein photos.
// Bytes are the stored web renditions as recorded at upload (thumbnails are small and left out).

const byteCount = z.number().int().nonnegative();

export const sharerStorageSchema = z.object({
  userId: z.string(),
  name: z.string(),
  bytes: byteCount,
  skeins: z.number().int(),
  photos: z.number().int(),
});
export type SharerStorage = z.infer<typeof sharerStorageSchema>;

/** GET /api/studios/:slug/storage (host only). */
export const studioStorageSchema = z.object({
  workbenchImages: z.object({ bytes: byteCount, images: z.number().int() }),
  skeinPhotos: z.object({ bytes: byteCount, skeins: z.number().int(), photos: z.number().int() }),
  totalBytes: byteCount,
  /** The limits each member shares under, as configured on the server. */
  limits: z.object({ sharesPerHour: z.number().int(), storageQuotaBytes: byteCount }),
  /** The members whose skein photos take the most room, most first. */
  topSharers: z.array(sharerStorageSchema),
});
export type StudioStorage = z.infer<typeof studioStorageSchema>;

/** How many sharers the storage panel lists. */
export const TOP_SHARERS = 5;
