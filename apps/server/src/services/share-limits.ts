import { and, eq, gt, sql, sum } from '@vatside/db/sql';
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

interface Usage {
  /** Shares since `since`, and when the oldest of them was made. */
  recent: number;
  oldestRecent: string | Date | null;
  /** Stored bytes of the person's skein photos in the studio (web renditions, as recorded). */
  bytes: number;
}

/** One person's use of one studio, in one query (a share checks it three times). */
async function sharerUsage(
  db: Pick<Database, 'select'>,
  who: { studioId: string; sharerId: string },
  since: Date,
): Promise<Usage> {
  const isRecent = gt(submissions.createdAt, since);
  const [usage] = await db
    .select({
      // Distinct: the join repeats a share once per photo.
      recent: sql<number>`count(distinct ${submissions.id}) filter (where ${isRecent})`.mapWith(
        Number,
      ),
      oldestRecent: sql<string | null>`min(${submissions.createdAt}) filter (where ${isRecent})`,
      bytes: sum(submissionPhotos.bytes).mapWith(Number),
    })
    .from(submissions)
    .leftJoin(submissionPhotos, eq(submissionPhotos.submissionId, submissions.id))
    .where(and(eq(submissions.studioId, who.studioId), eq(submissions.sharerUserId, who.sharerId)));
  return {
    recent: usage?.recent ?? 0,
    oldestRecent: usage?.oldestRecent ?? null,
    bytes: usage?.bytes ?? 0,
  };
}

/** Stored bytes of one person's skein photos in one studio (web renditions, as recorded). */
export async function sharerBytes(
  db: Pick<Database, 'select'>,
  studioId: string,
  sharerId: string,
): Promise<number> {
  return (await sharerUsage(db, { studioId, sharerId }, new Date())).bytes;
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
  const usage = await sharerUsage(db, who, new Date(now.getTime() - HOUR_MS));
  if (usage.recent >= limits.sharesPerHour) {
    const oldestMs = usage.oldestRecent ? new Date(usage.oldestRecent).getTime() : now.getTime();
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
  const used = usage.bytes;
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
