import type { Question, QuestionQueue, QuestionSort } from '@vatside/contracts/questions';
import type { Database } from '@vatside/db/client';
import { liveQuestionMeToos, liveQuestions, liveSessionMutes, user } from '@vatside/db/schema';
import { and, asc, count, desc, eq, inArray, isNotNull, isNull, max, sql } from '@vatside/db/sql';
import { HttpError, notFound } from '../http/errors.ts';

// The question queue of a live session. Who sees what: the staff (host, moderators) see every
// question with hidden ones and muted askers; signed-in viewers see the visible ones; visitors
// see only answered ones. Nobody sees an asker's e-mail or id, only the name they chose.

export type QuestionView = QuestionQueue['view'];

export interface QuestionLimits {
  minIntervalS: number;
  perSession: number;
}

type QuestionRow = typeof liveQuestions.$inferSelect;

const columns = {
  question: liveQuestions,
  askerName: user.name,
  askerMuted: liveSessionMutes.userId,
};

function selectQuestions(db: Database) {
  return db
    .select(columns)
    .from(liveQuestions)
    .innerJoin(user, eq(user.id, liveQuestions.askedBy))
    .leftJoin(
      liveSessionMutes,
      and(
        eq(liveSessionMutes.sessionId, liveQuestions.sessionId),
        eq(liveSessionMutes.userId, liveQuestions.askedBy),
      ),
    );
}

type Joined = { question: QuestionRow; askerName: string; askerMuted: string | null };

/** A question as `view` may see it; null when that view may not see it at all. */
export function asSeenBy(view: QuestionView, q: Question): Question | null {
  if (view === 'staff') return q;
  if (q.hidden || (view === 'visitor' && q.answeredAt === null)) return null;
  return { ...q, askerMuted: false };
}

function toQuestion({ question, askerName, askerMuted }: Joined): Question {
  return {
    id: question.id,
    sessionId: question.sessionId,
    text: question.text,
    askerName,
    askedAt: question.askedAt.toISOString(),
    meTooCount: question.meTooCount,
    answeredAt: question.answeredAt?.toISOString() ?? null,
    answer: question.answer,
    hidden: question.hiddenAt !== null,
    askerMuted: askerMuted !== null,
  };
}

export async function getQuestion(db: Database, sessionId: string, questionId: string) {
  const [row] = await selectQuestions(db).where(
    and(eq(liveQuestions.id, questionId), eq(liveQuestions.sessionId, sessionId)),
  );
  if (!row) throw notFound('That question');
  return { question: toQuestion(row), askedBy: row.question.askedBy };
}

export async function questionQueue(
  db: Database,
  sessionId: string,
  view: QuestionView,
  userId: string | null,
  sort: QuestionSort,
  limits: QuestionLimits,
): Promise<QuestionQueue> {
  const visible = and(
    eq(liveQuestions.sessionId, sessionId),
    view === 'staff' ? undefined : isNull(liveQuestions.hiddenAt),
    view === 'visitor' ? isNotNull(liveQuestions.answeredAt) : undefined,
  );
  const order =
    sort === 'meToo'
      ? [desc(liveQuestions.meTooCount), asc(liveQuestions.askedAt)]
      : [asc(liveQuestions.askedAt)];
  const rows = await selectQuestions(db)
    .where(visible)
    .orderBy(...order, asc(liveQuestions.id));
  const questions = rows.flatMap((r) => asSeenBy(view, toQuestion(r)) ?? []);
  const mine = userId ? await ownQuestions(db, sessionId, userId) : [];
  const meToos =
    userId && rows.length > 0
      ? await db
          .select({ id: liveQuestionMeToos.questionId })
          .from(liveQuestionMeToos)
          .where(
            and(
              eq(liveQuestionMeToos.userId, userId),
              inArray(
                liveQuestionMeToos.questionId,
                rows.map((r) => r.question.id),
              ),
            ),
          )
      : [];
  return {
    sessionId,
    view,
    questions,
    mine: mine.map((q) => q.id),
    meToos: meToos.map((m) => m.id),
    muted: userId ? await isMuted(db, sessionId, userId) : false,
    limits: { ...limits, asked: mine.length },
  };
}

const ownQuestions = (db: Database, sessionId: string, userId: string) =>
  db
    .select({ id: liveQuestions.id })
    .from(liveQuestions)
    .where(and(eq(liveQuestions.sessionId, sessionId), eq(liveQuestions.askedBy, userId)));

async function isMuted(db: Pick<Database, 'select'>, sessionId: string, userId: string) {
  const [mute] = await db
    .select({ userId: liveSessionMutes.userId })
    .from(liveSessionMutes)
    .where(and(eq(liveSessionMutes.sessionId, sessionId), eq(liveSessionMutes.userId, userId)));
  return mute !== undefined;
}

const rateLimited = (message: string) => new HttpError(429, 'RATE_LIMITED', message);

/**
 * Adds a question, within the person's limits. The checks and the insert run under a lock on
 * (session, person), so two quick taps, even through two server processes, cannot both pass.
 */
export async function askQuestion(
  db: Database,
  sessionId: string,
  userId: string,
  text: string,
  limits: QuestionLimits,
  nowMs = Date.now(),
): Promise<string> {
  return db.transaction(async (tx) => {
    await tx.execute(
      sql`select pg_advisory_xact_lock(hashtextextended(${`question:${sessionId}:${userId}`}, 0))`,
    );
    if (await isMuted(tx, sessionId, userId)) {
      throw new HttpError(
        403,
        'FORBIDDEN',
        'Questions from you are paused for this session. You can keep following along, and thank you for being here.',
      );
    }
    const [asked] = await tx
      .select({ n: count(), last: max(liveQuestions.askedAt) })
      .from(liveQuestions)
      .where(and(eq(liveQuestions.sessionId, sessionId), eq(liveQuestions.askedBy, userId)));
    if ((asked?.n ?? 0) >= limits.perSession) {
      throw rateLimited(
        `You have asked ${limits.perSession} questions in this session, the most there is room for. Add a “me too” to someone else’s question instead.`,
      );
    }
    const lastMs = asked?.last ? new Date(asked.last).getTime() : null;
    const waitS =
      lastMs === null ? 0 : Math.ceil((lastMs + limits.minIntervalS * 1000 - nowMs) / 1000);
    if (waitS > 0) {
      throw rateLimited(`One question at a time: you can ask again in ${waitS} s.`);
    }
    const [row] = await tx
      .insert(liveQuestions)
      .values({ sessionId, askedBy: userId, text, askedAt: new Date(nowMs) })
      .returning({ id: liveQuestions.id });
    return row!.id;
  });
}

/** One "me too" per person per question; not on one's own question or a hidden one. */
export async function addMeToo(
  db: Database,
  sessionId: string,
  questionId: string,
  userId: string,
) {
  const { question, askedBy } = await getQuestion(db, sessionId, questionId);
  if (question.hidden) throw notFound('That question');
  if (askedBy === userId) throw new HttpError(409, 'CONFLICT', 'That is your own question.');
  await db.transaction(async (tx) => {
    const added = await tx
      .insert(liveQuestionMeToos)
      .values({ questionId, userId })
      .onConflictDoNothing()
      .returning({ questionId: liveQuestionMeToos.questionId });
    if (added.length === 0)
      throw new HttpError(409, 'CONFLICT', 'You already added your “me too” to this question.');
    await tx
      .update(liveQuestions)
      .set({ meTooCount: sql`${liveQuestions.meTooCount} + 1` })
      .where(eq(liveQuestions.id, questionId));
  });
}

/** Marks a question answered; the short answer (may be empty) is shown to every viewer. */
export async function answerQuestion(
  db: Database,
  sessionId: string,
  questionId: string,
  answer: string,
  staffId: string,
) {
  await getQuestion(db, sessionId, questionId);
  await db
    .update(liveQuestions)
    .set({ answer, answeredAt: new Date(), answeredBy: staffId })
    .where(eq(liveQuestions.id, questionId));
}

export async function hideQuestion(
  db: Database,
  sessionId: string,
  questionId: string,
  hidden: boolean,
  staffId: string,
) {
  await getQuestion(db, sessionId, questionId);
  await db
    .update(liveQuestions)
    .set(hidden ? { hiddenAt: new Date(), hiddenBy: staffId } : { hiddenAt: null, hiddenBy: null })
    .where(eq(liveQuestions.id, questionId));
}

/** Mutes the asker of a question for this session; returns every question of theirs. */
export async function muteAsker(
  db: Database,
  sessionId: string,
  questionId: string,
  muted: boolean,
  staffId: string,
): Promise<Question[]> {
  const { askedBy } = await getQuestion(db, sessionId, questionId);
  if (muted) {
    await db
      .insert(liveSessionMutes)
      .values({ sessionId, userId: askedBy, mutedBy: staffId })
      .onConflictDoNothing();
  } else {
    await db
      .delete(liveSessionMutes)
      .where(and(eq(liveSessionMutes.sessionId, sessionId), eq(liveSessionMutes.userId, askedBy)));
  }
  const rows = await selectQuestions(db)
    .where(and(eq(liveQuestions.sessionId, sessionId), eq(liveQuestions.askedBy, askedBy)))
    .orderBy(asc(liveQuestions.askedAt));
  return rows.map(toQuestion);
}
