import { asc, count, eq, inArray, type SQL } from '@vatside/db/sql';
import type { GallerySkein } from '@vatside/contracts/gallery';
import type { ReviewSubmission } from '@vatside/contracts/review';
import type { Submission } from '@vatside/contracts/submissions';
import type { Database } from '@vatside/db/client';
import { colorways, dyeAlongs, submissionPhotos, submissions, user } from '@vatside/db/schema';
import { isoTimestamps } from './workbench-common.ts';

// Shared skeins as each reader sees them: the sharer (everything, with the moderator's reason),
// the staff (plus the sharer's name), the public gallery (no reason, no review details).

export type SubmissionRow = typeof submissions.$inferSelect;
export type PhotoRow = typeof submissionPhotos.$inferSelect;

export interface LoadedSubmission {
  row: SubmissionRow;
  dyeAlongTitle: string;
  colorwayName: string | null;
  sharerName: string;
  photos: PhotoRow[];
}

/** Same-origin photo URLs; the route decides on every request who may see the bytes. */
export const photoUrl = (
  slug: string,
  submissionId: string,
  photoId: string,
  which: 'web' | 'thumb',
) => `/api/studios/${slug}/submissions/${submissionId}/photos/${photoId}/${which}`;

export async function photosOf(db: Database, submissionIds: string[]) {
  const bySubmission = new Map<string, PhotoRow[]>();
  if (submissionIds.length === 0) return bySubmission;
  const rows = await db
    .select()
    .from(submissionPhotos)
    .where(inArray(submissionPhotos.submissionId, submissionIds))
    .orderBy(asc(submissionPhotos.position));
  for (const photo of rows) {
    bySubmission.set(photo.submissionId, [...(bySubmission.get(photo.submissionId) ?? []), photo]);
  }
  return bySubmission;
}

/** One page of skeins matching `where`, in `order`, with their photos and names. */
export async function loadSubmissions(
  db: Database,
  where: SQL | undefined,
  order: SQL[],
  page: { limit: number; offset: number },
): Promise<{ items: LoadedSubmission[]; total: number }> {
  const [rows, [total]] = await Promise.all([
    db
      .select({
        row: submissions,
        dyeAlongTitle: dyeAlongs.title,
        colorwayName: colorways.name,
        sharerName: user.name,
      })
      .from(submissions)
      .innerJoin(dyeAlongs, eq(dyeAlongs.id, submissions.dyeAlongId))
      .innerJoin(user, eq(user.id, submissions.sharerUserId))
      .leftJoin(colorways, eq(colorways.id, submissions.colorwayId))
      .where(where)
      .orderBy(...order)
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(submissions).where(where),
  ]);
  const photos = await photosOf(
    db,
    rows.map((r) => r.row.id),
  );
  return {
    items: rows.map((r) => ({ ...r, photos: photos.get(r.row.id) ?? [] })),
    total: total?.n ?? 0,
  };
}

const closenessOf = (row: SubmissionRow) =>
  row.closenessBand && row.closenessMessage
    ? { band: row.closenessBand, message: row.closenessMessage }
    : null;

const colorwayOf = (s: LoadedSubmission) =>
  s.row.colorwayId && s.colorwayName ? { id: s.row.colorwayId, name: s.colorwayName } : null;

export function toSubmission(s: LoadedSubmission, slug: string): Submission {
  const { row } = s;
  return {
    id: row.id,
    dyeAlong: { id: row.dyeAlongId, title: s.dyeAlongTitle },
    colorway: colorwayOf(s),
    baseName: row.baseName,
    fiberContent: row.fiberContent,
    dyesUsed: row.dyesUsed,
    notes: row.notes,
    consentToFeature: row.consentToFeature,
    status: row.status,
    reason: row.reason,
    closeness: closenessOf(row),
    yarnPalette: row.yarnPalette,
    photos: s.photos.map((p) => ({
      id: p.id,
      position: p.position,
      width: p.width,
      height: p.height,
      thumbWidth: p.thumbWidth,
      thumbHeight: p.thumbHeight,
      yarnCrop: p.yarnCrop,
      webUrl: photoUrl(slug, row.id, p.id, 'web'),
      thumbUrl: photoUrl(slug, row.id, p.id, 'thumb'),
    })),
    waitingSince: row.waitingSince.toISOString(),
    ...isoTimestamps(row),
  };
}

export const toReviewSubmission = (s: LoadedSubmission, slug: string): ReviewSubmission => ({
  ...toSubmission(s, slug),
  sharer: { name: s.sharerName },
});

export function toGallerySkein(s: LoadedSubmission, slug: string): GallerySkein {
  const { row } = s;
  return {
    id: row.id,
    makerName: s.sharerName,
    colorway: colorwayOf(s),
    baseName: row.baseName,
    fiberContent: row.fiberContent,
    dyesUsed: row.dyesUsed,
    notes: row.notes,
    featured: row.status === 'featured',
    closeness: closenessOf(row),
    photos: s.photos.map((p) => ({
      id: p.id,
      width: p.width,
      height: p.height,
      thumbWidth: p.thumbWidth,
      thumbHeight: p.thumbHeight,
      webUrl: photoUrl(slug, row.id, p.id, 'web'),
      thumbUrl: photoUrl(slug, row.id, p.id, 'thumb'),
    })),
    sharedAt: row.createdAt.toISOString(),
  };
}
