import { and, eq, inArray, isNull, sql } from '@vatside/db/sql';
import type { ReviewMailUnsubscribeResult } from '@vatside/contracts/review';
import type { Database } from '@vatside/db/client';
import { reviewMailOptOuts, reviewMailOutbox, studios, submissions } from '@vatside/db/schema';
import { HttpError, notFound } from '../http/errors.ts';
import { readUnsubscribeToken, type UnsubscribeClaim } from '../mail/unsubscribe-token.ts';

// One-click stop for review e-mails: the signed token in the footer names the person and the
// studio; no sign-in. GET only describes (mail scanners follow links); POST stops them.

function claimOf(secret: string, token: string): UnsubscribeClaim {
  const claim = readUnsubscribeToken(secret, token);
  if (!claim) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'This unsubscribe link is not valid.', {
      token: ['The link was changed or cut short; use the one in the e-mail.'],
    });
  }
  return claim;
}

async function current(
  db: Database,
  claim: UnsubscribeClaim,
): Promise<ReviewMailUnsubscribeResult> {
  const [found] = await db
    .select({ slug: studios.slug, name: studios.name, optedOut: reviewMailOptOuts.userId })
    .from(studios)
    .leftJoin(
      reviewMailOptOuts,
      and(eq(reviewMailOptOuts.studioId, studios.id), eq(reviewMailOptOuts.userId, claim.userId)),
    )
    .where(eq(studios.id, claim.studioId));
  if (!found) throw notFound('That studio');
  return { studio: { slug: found.slug, name: found.name }, reviewMails: !found.optedOut };
}

export function describeReviewUnsubscribe(db: Database, secret: string, token: string) {
  return current(db, claimOf(secret, token));
}

/** Stops review e-mails from this studio at once, including any already queued. */
export async function reviewUnsubscribe(
  db: Database,
  secret: string,
  token: string,
): Promise<ReviewMailUnsubscribeResult> {
  const claim = claimOf(secret, token);
  await db.transaction(async (tx) => {
    const [studio] = await tx
      .select({ id: studios.id })
      .from(studios)
      .where(eq(studios.id, claim.studioId));
    if (!studio) throw notFound('That studio');
    await tx.insert(reviewMailOptOuts).values(claim).onConflictDoNothing();
    const theirs = tx
      .select({ id: submissions.id })
      .from(submissions)
      .where(
        and(eq(submissions.studioId, claim.studioId), eq(submissions.sharerUserId, claim.userId)),
      );
    await tx
      .update(reviewMailOutbox)
      .set({ skippedAt: sql`now()`, skipReason: 'optedOut' })
      .where(
        and(
          inArray(reviewMailOutbox.submissionId, theirs),
          isNull(reviewMailOutbox.sentAt),
          isNull(reviewMailOutbox.skippedAt),
        ),
      );
  });
  return current(db, claim);
}
