import {
  questionAnswerSchema,
  questionAskSchema,
  questionHideSchema,
  questionMeTooSchema,
  questionMuteSchema,
  questionsJoinSchema,
  type Question,
} from '@vatside/contracts/questions';
import type { RealtimeError } from '@vatside/contracts/realtime';
import type { Database } from '@vatside/db/client';
import type { Config } from '../config.ts';
import { HttpError } from '../http/errors.ts';
import type { RealtimeServer, RealtimeSocket } from '../realtime/socket-server.ts';
import {
  addMeToo,
  answerQuestion,
  askQuestion,
  asSeenBy,
  getQuestion,
  hideQuestion,
  muteAsker,
  questionQueue,
  type QuestionView,
} from './questions.ts';
import {
  refusing,
  requireSessionRole,
  requireSignedIn,
  sessionAccess,
  type SessionAccess,
} from './session-access.ts';
import { sessionState } from './sessions.ts';

const views: QuestionView[] = ['staff', 'viewer', 'visitor'];
const questionRoom = (sessionId: string, view: QuestionView) => `questions:${sessionId}:${view}`;

export const questionViewOf = (access: SessionAccess): QuestionView =>
  access.standing === 'host' || access.standing === 'moderator'
    ? 'staff'
    : access.userId
      ? 'viewer'
      : 'visitor';

const invalid = (message: string): RealtimeError => ({
  error: { code: 'VALIDATION_FAILED', message },
});

/** The question queue over Socket.IO: one room per view, so each sees only what it may. */
export function createQuestionHub(io: RealtimeServer, db: Database, config: Config) {
  const limits = {
    minIntervalS: config.QUESTION_MIN_INTERVAL_S,
    perSession: config.QUESTIONS_PER_SESSION,
  };

  function publish(q: Question) {
    for (const view of views) {
      const seen = asSeenBy(view, q);
      const room = io.to(questionRoom(q.sessionId, view));
      if (seen) room.emit('questions:changed', seen);
      // Hidden after viewers saw it: take it off their screens.
      else if (view !== 'staff' && q.hidden)
        room.emit('questions:removed', { sessionId: q.sessionId, questionId: q.id });
    }
  }

  async function access(socket: RealtimeSocket, sessionId: string) {
    return sessionAccess(db, sessionId, socket.data.user?.id);
  }

  async function join(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionsJoinSchema.safeParse(payload);
    if (!parsed.success) return invalid('Send the session id.');
    return refusing(async () => {
      const who = await access(socket, parsed.data.sessionId);
      const view = questionViewOf(who);
      for (const v of views) await socket.leave(questionRoom(who.row.id, v));
      await socket.join(questionRoom(who.row.id, view));
      return questionQueue(db, who.row.id, view, who.userId, 'time', limits);
    });
  }

  async function ask(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionAskSchema.safeParse(payload);
    if (!parsed.success) return invalid('A question is 1 to 280 characters.');
    return refusing(async () => {
      const who = await access(socket, parsed.data.sessionId);
      const userId = requireSignedIn(who);
      if (sessionState(who.row).status === 'ended')
        throw new HttpError(409, 'CONFLICT', 'This session has ended; questions are closed.');
      const id = await askQuestion(db, who.row.id, userId, parsed.data.text, limits);
      const { question } = await getQuestion(db, who.row.id, id);
      publish(question);
      return { question: asSeenBy(questionViewOf(who), question) ?? question };
    });
  }

  async function meToo(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionMeTooSchema.safeParse(payload);
    if (!parsed.success) return invalid('Send the session and question ids.');
    return refusing(async () => {
      const who = await access(socket, parsed.data.sessionId);
      const userId = requireSignedIn(who);
      await addMeToo(db, who.row.id, parsed.data.questionId, userId);
      const { question } = await getQuestion(db, who.row.id, parsed.data.questionId);
      publish(question);
      return { question: asSeenBy(questionViewOf(who), question) ?? question };
    });
  }

  /** Answer and hide: staff only, each followed by the change to every view. */
  function staffOnly(
    socket: RealtimeSocket,
    ids: { sessionId: string; questionId: string },
    work: (sessionId: string, staffId: string) => Promise<void>,
  ) {
    return refusing(async () => {
      const who = await access(socket, ids.sessionId);
      requireSessionRole(who, 'live:moderate');
      await work(who.row.id, who.userId!);
      const { question } = await getQuestion(db, who.row.id, ids.questionId);
      publish(question);
      return { question };
    });
  }

  async function answer(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionAnswerSchema.safeParse(payload);
    if (!parsed.success) return invalid('Send the question; an answer is at most 280 characters.');
    const { questionId, answer: text } = parsed.data;
    return staffOnly(socket, parsed.data, (sessionId, staffId) =>
      answerQuestion(db, sessionId, questionId, text, staffId),
    );
  }

  async function hide(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionHideSchema.safeParse(payload);
    if (!parsed.success) return invalid('Send the session and question ids, and hidden.');
    const { questionId, hidden } = parsed.data;
    return staffOnly(socket, parsed.data, (sessionId, staffId) =>
      hideQuestion(db, sessionId, questionId, hidden, staffId),
    );
  }

  async function mute(socket: RealtimeSocket, payload: unknown) {
    const parsed = questionMuteSchema.safeParse(payload);
    if (!parsed.success) return invalid('Send the session and question ids, and muted.');
    return refusing(async () => {
      const who = await access(socket, parsed.data.sessionId);
      requireSessionRole(who, 'live:moderate');
      const { sessionId, questionId, muted } = parsed.data;
      const theirs = await muteAsker(db, who.row.id, questionId, muted, who.userId!);
      // Only the staff see who is muted; viewers' copies do not change.
      for (const q of theirs) io.to(questionRoom(sessionId, 'staff')).emit('questions:changed', q);
      return { question: theirs.find((q) => q.id === questionId)! };
    });
  }

  return { join, ask, meToo, answer, hide, mute, limits };
}
