import { alias, and, asc, desc, eq } from '@vatside/db/sql';
import {
  REVIEW_REASON_TEMPLATES,
  type AuditList,
  type BulkResult,
  type ReviewAction,
  type ReviewQueue,
  type ReviewSubmission,
  type auditQuerySchema,
  type bulkDecisionSchema,
  type reviewDecisionSchema,
  type reviewQueueQuerySchema,
} from '@vatside/contracts/review';
import type { SubmissionStatus } from '@vatside/contracts/submissions';
import type { Database } from '@vatside/db/client';
import { reviewDecisions, submissions, user } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { recordDecision } from './review-record.ts';
import { loadSubmissions, toReviewSubmission } from './submission-view.ts';
import type { StudioRef } from './submissions.ts';
import { pageInfo } from './workbench-common.ts';

// The review queue of moderators and the host: oldest waiting first, decisions one at a time or
// in bulk (each skein checked on its own), every decision audited.

type Decision = z.output<typeof reviewDecisionSchema>;

/** Which statuses each decision may start from, and where it leads. */
const RULES: Record<ReviewAction, { from: SubmissionStatus[]; to: SubmissionStatus }> = {
  approve: { from: ['waiting', 'needsChanges', 'rejected'], to: 'approved' },
  needsChanges: { from: ['waiting', 'approved', 'rejected'], to: 'needsChanges' },
  reject: { from: ['waiting', 'approved', 'needsChanges'], to: 'rejected' },
  feature: { from: ['waiting', 'approved'], to: 'featured' },
  unfeature: { from: ['featured'], to: 'approved' },
};

const reasonText = (d: Pick<Decision, 'reason' | 'reasonTemplate'>) =>
  d.reason ?? REVIEW_REASON_TEMPLATES.find((t) => t.id === d.reasonTemplate)?.text ?? null;

export async function reviewQueue(
  db: Database,
  studio: StudioRef,
  query: z.output<typeof reviewQueueQuerySchema>,
): Promise<ReviewQueue> {
  const { items, total } = await loadSubmissions(
    db,
    and(
      eq(submissions.studioId, studio.id),
      eq(submissions.status, query.status),
      query.dyeAlongId ? eq(submissions.dyeAlongId, query.dyeAlongId) : undefined,
    ),
    // The queue proper is oldest first; a look at past decisions is most recent first.
    query.status === 'waiting'
      ? [asc(submissions.waitingSince), asc(submissions.id)]
      : [desc(submissions.updatedAt), asc(submissions.id)],
    query,
  );
  return {
    items: items.map((s) => toReviewSubmission(s, studio.slug)),
    page: pageInfo(query, total),
  };
}

export async function reviewSubmission(
  db: Database,
  studio: StudioRef,
  id: string,
): Promise<ReviewSubmission> {
  const { items } = await loadSubmissions(
    db,
    and(eq(submissions.studioId, studio.id), eq(submissions.id, id)),
    [],
    { limit: 1, offset: 0 },
  );
  if (!items[0]) throw notFound('That skein');
  return toReviewSubmission(items[0], studio.slug);
}

/** One decision on one skein, in its own transaction with the row locked. */
async function decide(
  db: Database,
  studio: StudioRef,
  actorUserId: string,
  id: string,
  decision: Decision,
): Promise<SubmissionStatus> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(submissions)
      .where(and(eq(submissions.studioId, studio.id), eq(submissions.id, id)))
      .for('update');
    if (!row) throw notFound('That skein');
    const rule = RULES[decision.decision];
    if (!rule.from.includes(row.status)) {
      throw new HttpError(
        409,
        'CONFLICT',
        row.status === rule.to
          ? `It is already ${rule.to}.`
          : `A skein that is ${row.status} cannot take "${decision.decision}"; it can from ${rule.from.join(', ')}.`,
      );
    }
    if (decision.decision === 'feature' && !row.consentToFeature) {
      throw new HttpError(409, 'CONFLICT', 'The maker has not agreed to be featured.');
    }
    const keepsReason = rule.to === 'needsChanges' || rule.to === 'rejected';
    const reason = keepsReason ? reasonText(decision) : null;
    await tx.update(submissions).set({ status: rule.to, reason }).where(eq(submissions.id, row.id));
    await recordDecision(tx, row, { action: decision.decision, to: rule.to, reason, actorUserId });
    return rule.to;
  });
}

export async function decideOne(
  db: Database,
  studio: StudioRef,
  actorUserId: string,
  id: string,
  decision: Decision,
): Promise<ReviewSubmission> {
  await decide(db, studio, actorUserId, id, decision);
  return reviewSubmission(db, studio, id);
}

/** Each skein is decided on its own: one refused (gone, wrong status) does not stop the rest. */
export async function decideMany(
  db: Database,
  studio: StudioRef,
  actorUserId: string,
  input: z.output<typeof bulkDecisionSchema>,
): Promise<BulkResult> {
  const results: BulkResult['results'] = [];
  for (const submissionId of input.submissionIds) {
    try {
      const status = await decide(db, studio, actorUserId, submissionId, input);
      results.push({ submissionId, ok: true, status });
    } catch (error) {
      if (!(error instanceof HttpError)) throw error;
      results.push({
        submissionId,
        ok: false,
        error: { code: error.code, message: error.message },
      });
    }
  }
  return { results };
}

/** Who shared the skein a decision was about (a second join on the user table). */
const maker = alias(user, 'maker');

export async function auditLog(
  db: Database,
  studio: StudioRef,
  query: z.output<typeof auditQuerySchema>,
): Promise<AuditList> {
  const where = and(
    eq(reviewDecisions.studioId, studio.id),
    query.dyeAlongId ? eq(reviewDecisions.dyeAlongId, query.dyeAlongId) : undefined,
    query.submissionId ? eq(reviewDecisions.submissionId, query.submissionId) : undefined,
  );
  const [rows, total] = await Promise.all([
    db
      .select({
        decision: reviewDecisions,
        actorName: user.name,
        baseName: submissions.baseName,
        makerName: maker.name,
      })
      .from(reviewDecisions)
      .leftJoin(user, eq(user.id, reviewDecisions.actorUserId))
      .leftJoin(submissions, eq(submissions.id, reviewDecisions.submissionId))
      .leftJoin(maker, eq(maker.id, submissions.sharerUserId))
      .where(where)
      .orderBy(desc(reviewDecisions.createdAt), desc(reviewDecisions.id))
      .limit(query.limit)
      .offset(query.offset),
    db.$count(reviewDecisions, where),
  ]);
  return {
    items: rows.map(({ decision: d, actorName, baseName, makerName }) => ({
      id: d.id,
      submissionId: d.submissionId,
      dyeAlongId: d.dyeAlongId,
      action: d.action,
      fromStatus: d.fromStatus,
      toStatus: d.toStatus,
      reason: d.reason,
      actor: d.actorUserId && actorName ? { userId: d.actorUserId, name: actorName } : null,
      skein: baseName === null ? null : { makerName, baseName },
      createdAt: d.createdAt.toISOString(),
    })),
    page: pageInfo(query, total),
  };
}
