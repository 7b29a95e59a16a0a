import { TOP_SHARERS, type StudioStorage } from '@vatside/contracts/storage';
import { count, countDistinct, desc, eq, sum } from '@vatside/db/sql';
import type { Database } from '@vatside/db/client';
import { images, submissionPhotos, submissions, user } from '@vatside/db/schema';
import type { ShareLimits } from './share-limits.ts';

// What a studio keeps in the object store, summed from the rows that record each object.

export async function studioStorage(
  db: Database,
  studioId: string,
  limits: ShareLimits,
): Promise<StudioStorage> {
  const [workbench] = await db
    .select({ bytes: sum(images.bytes).mapWith(Number), images: count() })
    .from(images)
    .where(eq(images.studioId, studioId));
  const photoBytes = sum(submissionPhotos.bytes).mapWith(Number);
  const skeinCount = countDistinct(submissions.id);
  const [skeins] = await db
    .select({ bytes: photoBytes, skeins: skeinCount, photos: count() })
    .from(submissionPhotos)
    .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
    .where(eq(submissions.studioId, studioId));
  const topSharers = await db
    .select({
      userId: submissions.sharerUserId,
      name: user.name,
      bytes: photoBytes,
      skeins: skeinCount,
      photos: count(),
    })
    .from(submissionPhotos)
    .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
    .innerJoin(user, eq(user.id, submissions.sharerUserId))
    .where(eq(submissions.studioId, studioId))
    .groupBy(submissions.sharerUserId, user.name)
    .orderBy(desc(photoBytes), submissions.sharerUserId)
    .limit(TOP_SHARERS);
  const workbenchImages = { bytes: workbench?.bytes ?? 0, images: workbench?.images ?? 0 };
  const skeinPhotos = {
    bytes: skeins?.bytes ?? 0,
    skeins: skeins?.skeins ?? 0,
    photos: skeins?.photos ?? 0,
  };
  return {
    workbenchImages,
    skeinPhotos,
    totalBytes: workbenchImages.bytes + skeinPhotos.bytes,
    limits,
    topSharers,
  };
}
