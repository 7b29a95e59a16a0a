import { z } from 'zod';

// Questions during a live session: signed-in viewers ask, others add "me too", the host and
// moderators answer, hide, or mute someone for the session. Nobody sees an asker's e-mail.

export const maxQuestionLength = 280;
export const maxAnswerLength = 280;

export const questionSortSchema = z.enum(['time', 'meToo']);
export type QuestionSort = z.infer<typeof questionSortSchema>;

const sessionRef = { sessionId: z.uuid() };
const questionRef = { ...sessionRef, questionId: z.uuid() };

export const questionsJoinSchema = z.object(sessionRef);
export const questionAskSchema = z.object({
  ...sessionRef,
  text: z.string().trim().min(1).max(maxQuestionLength),
});
export const questionMeTooSchema = z.object(questionRef);
export const questionAnswerSchema = z.object({
  ...questionRef,
  /** Empty: marked answered on the stream, with no written answer. */
  answer: z.string().trim().max(maxAnswerLength).default(''),
});
export const questionHideSchema = z.object({ ...questionRef, hidden: z.boolean() });
/** Mutes (or unmutes) the person who asked this question, for this session only. */
export const questionMuteSchema = z.object({ ...questionRef, muted: z.boolean() });

export const questionSchema = z.object({
  id: z.uuid(),
  sessionId: z.uuid(),
  text: z.string(),
  askerName: z.string(),
  askedAt: z.string(),
  meTooCount: z.number().int().nonnegative(),
  /** Set when answered; `answer` may stay empty (answered out loud). */
  answeredAt: z.string().nullable(),
  answer: z.string(),
  /** Staff only: hidden questions and muted askers; viewers never see either. */
  hidden: z.boolean(),
  askerMuted: z.boolean(),
});
export type Question = z.infer<typeof questionSchema>;

/** What one person knows about the queue: their own questions and "me too"s, and their limits. */
export const questionQueueSchema = z.object({
  sessionId: z.uuid(),
  view: z.enum(['staff', 'viewer', 'visitor']),
  questions: z.array(questionSchema),
  mine: z.array(z.uuid()),
  meToos: z.array(z.uuid()),
  muted: z.boolean(),
  limits: z.object({ minIntervalS: z.number(), perSession: z.number(), asked: z.number() }),
});
export type QuestionQueue = z.infer<typeof questionQueueSchema>;

/** GET /api/live-sessions/:sessionId/questions?sort=time|meToo */
export const questionQueueQuerySchema = z.object({ sort: questionSortSchema.default('time') });

export interface QuestionRemoved {
  sessionId: string;
  questionId: string;
}
