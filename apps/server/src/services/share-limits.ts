import { and, count, eq, gt, min, sql, sum } from '@vatside/db/sql';
import type { Database } from '@vatside/db/client';
import { submissionPhotos, submissions } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';

// How much one person may share in one studio: a number of shares per hour and a total of
// stored photo bytes. Both are counted from the database, so every server process agrees.

export interface ShareLimits {
  sharesPerHour: number;
  storageQuotaBytes: number;
}

const HOUR_MS = 60 * 60 * 1000;

const megabytes = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

/** Stored bytes of one person's skein photos in one studio (web renditions, as recorded). */
export async function sharerBytes(
  db: Pick<Database, 'select'>,
  studioId: string,
  sharerId: string,
): Promise<number> {
  const [used] = await db
    .select({ bytes: sum(submissionPhotos.bytes).mapWith(Number) })
    .from(submissionPhotos)
    .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
    .where(and(eq(submissions.studioId, studioId), eq(submissions.sharerUserId, sharerId)));
  return used?.bytes ?? 0;
}

/**
 * Refuses a share that would go past either limit: 429 with Retry-After (seconds until the
 * oldest share of the last hour drops out) or 413 naming the room left. `incomingBytes` is 0
 * before the photos are read (is there any room at all?) and their stored size once processed.
 */
export async function checkShareLimits(
  db: Pick<Database, 'select'>,
  who: { studioId: string; sharerId: string },
  limits: ShareLimits,
  incomingBytes = 0,
  now = new Date(),
): Promise<void> {
  const since = new Date(now.getTime() - HOUR_MS);
  const [recent] = await db
    .select({ n: count(), oldest: min(submissions.createdAt) })
    .from(submissions)
    .where(
      and(
        eq(submissions.studioId, who.studioId),
        eq(submissions.sharerUserId, who.sharerId),
        gt(submissions.createdAt, since),
      ),
    );
  if ((recent?.n ?? 0) >= limits.sharesPerHour) {
    const oldestMs = recent?.oldest ? new Date(recent.oldest).getTime() : now.getTime();
    const waitS = Math.max(1, Math.ceil((oldestMs + HOUR_MS - now.getTime()) / 1000));
    const minutes = Math.ceil(waitS / 60);
    throw new HttpError(
      429,
      'RATE_LIMITED',
      `You have shared ${limits.sharesPerHour} skeins in the last hour, the most there is room for. You can share again in about ${minutes} ${minutes === 1 ? 'minute' : 'minutes'}; what you typed is kept.`,
      undefined,
      { 'Retry-After': String(waitS) },
    );
  }
  const used = await sharerBytes(db, who.studioId, who.sharerId);
  const full =
    incomingBytes === 0
      ? used >= limits.storageQuotaBytes
      : used + incomingBytes > limits.storageQuotaBytes;
  if (full) {
    const left = Math.max(0, limits.storageQuotaBytes - used);
    throw new HttpError(
      413,
      'QUOTA_EXCEEDED',
      `Your skein photos in this studio use ${megabytes(used)} of the ${megabytes(limits.storageQuotaBytes)} each member may keep${incomingBytes ? `, and these would need ${megabytes(incomingBytes)} (${megabytes(left)} left)` : ''}. Withdraw an older skein in My skeins to make room, or share fewer photos.`,
    );
  }
}

/** Serializes one person's shares in one studio for the rest of the transaction. */
export async function lockSharer(
  tx: Pick<Database, 'execute'>,
  who: { studioId: string; sharerId: string },
): Promise<void> {
  await tx.execute(
    sql`select pg_advisory_xact_lock(hashtextextended(${`share:${who.studioId}:${who.sharerId}`}, 0))`,
  );
}
