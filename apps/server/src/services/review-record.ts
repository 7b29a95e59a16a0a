import { eq } from '@vatside/db/sql';
import type { ReviewAction } from '@vatside/contracts/review';
import type { SubmissionStatus } from '@vatside/contracts/submissions';
import { recapItems, reviewDecisions, reviewMailOutbox } from '@vatside/db/schema';
import type { Tx } from '../jobs/dye-along-mail-queue.ts';
import type { SubmissionRow } from './submission-view.ts';

// What every status change of a shared skein writes, inside the caller's transaction: the audit
// row, the sharer's e-mail (through the outbox), and leaving the recap when no longer featured.

const MAIL_FOR: Partial<Record<ReviewAction, 'approved' | 'needsChanges' | 'featured'>> = {
  approve: 'approved',
  needsChanges: 'needsChanges',
  feature: 'featured',
};

export async function recordDecision(
  tx: Tx,
  row: SubmissionRow,
  change: {
    action: ReviewAction;
    to: SubmissionStatus;
    reason: string | null;
    actorUserId: string;
  },
): Promise<void> {
  const [decision] = await tx
    .insert(reviewDecisions)
    .values({
      studioId: row.studioId,
      dyeAlongId: row.dyeAlongId,
      submissionId: row.id,
      action: change.action,
      fromStatus: row.status,
      toStatus: change.to,
      reason: change.reason,
      actorUserId: change.actorUserId,
    })
    .returning({ id: reviewDecisions.id });
  const kind = MAIL_FOR[change.action];
  if (kind) {
    await tx.insert(reviewMailOutbox).values({
      kind,
      decisionId: decision!.id,
      submissionId: row.id,
      recipientUserId: row.sharerUserId,
    });
  }
  if (row.status === 'featured' && change.to !== 'featured') {
    await tx.delete(recapItems).where(eq(recapItems.submissionId, row.id));
  }
}
