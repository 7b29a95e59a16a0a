import { and, asc, eq, isNull, lte, sql } from '@vatside/db/sql';
import { reviewMailPaths } from '@vatside/contracts/review';
import {
  dyeAlongs,
  reviewDecisions,
  reviewMailOptOuts,
  reviewMailOutbox,
  studios,
  submissions,
  user,
} from '@vatside/db/schema';
import type { AppDeps } from '../deps.ts';
import { reviewMail } from '../mail/review-mails.ts';
import { unsubscribeToken } from '../mail/unsubscribe-token.ts';
import type { Tx } from './dye-along-mail-queue.ts';

// Review e-mails from their outbox, handled by the mail job beside the dye-along mails and in
// the same way: a row is claimed FOR UPDATE SKIP LOCKED and marked sent in the transaction that
// sends it, so a restart neither loses nor repeats one.

type OutboxRow = typeof reviewMailOutbox.$inferSelect;

/** The status a mail's news still holds in; after a later decision the mail would mislead. */
const STILL_TRUE: Record<OutboxRow['kind'], string[]> = {
  approved: ['approved', 'featured'],
  needsChanges: ['needsChanges'],
  featured: ['featured'],
};

export interface ReviewMailOptions {
  maxAttempts: number;
  retryDelayMs: (attempts: number) => number;
}

const skip = (tx: Tx, row: OutboxRow, reason: string) =>
  tx
    .update(reviewMailOutbox)
    .set({ skippedAt: sql`now()`, skipReason: reason })
    .where(eq(reviewMailOutbox.id, row.id));

async function deliver(deps: AppDeps, tx: Tx, row: OutboxRow, options: ReviewMailOptions) {
  const [found] = await tx
    .select({
      submission: submissions,
      title: dyeAlongs.title,
      studio: studios,
      person: user,
      reason: reviewDecisions.reason,
      optedOut: reviewMailOptOuts.userId,
    })
    .from(submissions)
    .innerJoin(dyeAlongs, eq(dyeAlongs.id, submissions.dyeAlongId))
    .innerJoin(studios, eq(studios.id, submissions.studioId))
    .innerJoin(user, eq(user.id, row.recipientUserId))
    .innerJoin(reviewDecisions, eq(reviewDecisions.id, row.decisionId))
    .leftJoin(
      reviewMailOptOuts,
      and(
        eq(reviewMailOptOuts.studioId, submissions.studioId),
        eq(reviewMailOptOuts.userId, row.recipientUserId),
      ),
    )
    .where(eq(submissions.id, row.submissionId));
  if (!found) return skip(tx, row, 'gone');
  // Checked just before sending: an unsubscribe a second ago is honored.
  if (found.optedOut) return skip(tx, row, 'optedOut');
  if (!STILL_TRUE[row.kind].includes(found.submission.status)) return skip(tx, row, 'superseded');

  const origin = deps.config.PUBLIC_ORIGIN;
  const token = unsubscribeToken(deps.config.BETTER_AUTH_SECRET, {
    studioId: found.studio.id,
    userId: found.person.id,
  });
  try {
    const { messageId } = await deps.mailer.send(
      reviewMail({
        kind: row.kind,
        to: found.person.email,
        recipientName: found.person.name,
        studioName: found.studio.name,
        dyeAlongTitle: found.title,
        reason: found.reason,
        closenessMessage: found.submission.closenessMessage,
        mySkeinsUrl: new URL(reviewMailPaths.mySkeins(found.studio.slug), origin).href,
        unsubscribePageUrl: new URL(reviewMailPaths.unsubscribe(token), origin).href,
        oneClickUrl: new URL(`/api/mail/review-unsubscribe?token=${token}`, origin).href,
        messageId: `<review-${row.id}@${new URL(origin).hostname}>`,
      }),
    );
    await tx
      .update(reviewMailOutbox)
      .set({ sentAt: sql`now()`, attempts: row.attempts + 1, messageId, lastError: null })
      .where(eq(reviewMailOutbox.id, row.id));
  } catch (error) {
    const attempts = row.attempts + 1;
    const message = error instanceof Error ? error.message : String(error);
    deps.logger.warn(
      { outboxId: row.id, attempts, err: message },
      'review mail not sent; will retry',
    );
    await tx
      .update(reviewMailOutbox)
      .set({
        attempts,
        lastError: message.slice(0, 500),
        ...(attempts >= options.maxAttempts
          ? { failedAt: sql`now()` }
          : { runAfter: new Date(Date.now() + options.retryDelayMs(attempts)) }),
      })
      .where(eq(reviewMailOutbox.id, row.id));
  }
}

/** Claims and handles one due review mail; false when none is due (or all are held by others). */
export function processOneReviewMail(deps: AppDeps, options: ReviewMailOptions): Promise<boolean> {
  return deps.database.db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(reviewMailOutbox)
      .where(
        and(
          isNull(reviewMailOutbox.sentAt),
          isNull(reviewMailOutbox.skippedAt),
          isNull(reviewMailOutbox.failedAt),
          lte(reviewMailOutbox.runAfter, sql`now()`),
        ),
      )
      .orderBy(asc(reviewMailOutbox.runAfter))
      .limit(1)
      .for('update', { skipLocked: true });
    if (!row) return false;
    await deliver(deps, tx, row, options);
    return true;
  });
}
