import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { Question, QuestionQueue, QuestionRemoved } from '@vatside/contracts/questions';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { useCallback, useEffect, useState } from 'react';
import { questionsQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

type Reply = { question: Question } | RealtimeError;

const upsert = (queue: QuestionQueue | undefined, question: Question) =>
  queue && {
    ...queue,
    questions: queue.questions.some((q) => q.id === question.id)
      ? queue.questions.map((q) => (q.id === question.id ? question : q))
      : [...queue.questions, question],
  };

/** Kind words for the server's refusals; the rate limit's own message says how long to wait. */
function refusalText({ error }: RealtimeError): string {
  if (error.code === 'RATE_LIMITED') return `Thanks! ${error.message}`;
  if (error.code === 'UNAUTHENTICATED') return 'Sign in to ask or add “me too”.';
  return error.message;
}

/** The questions of a session for a viewer: joined on every (re)connect, kept fresh by pushes. */
export function useQuestions(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const { data: queue } = useQuery(questionsQueryOptions(sessionId));
  const [refusal, setRefusal] = useState<string | null>(null);

  useEffect(() => {
    const key = questionsQueryOptions(sessionId).queryKey;
    const join = async () => {
      try {
        const reply = await socket
          .timeout(ackTimeoutMs)
          .emitWithAck('questions:join', { sessionId });
        if ('error' in reply) setRefusal(refusalText(reply));
        else queryClient.setQueryData(key, reply);
      } catch {
        // The next reconnect asks again.
      }
    };
    const onConnect = () => void join();
    const onChanged = (question: Question) => {
      if (question.sessionId === sessionId)
        queryClient.setQueryData<QuestionQueue>(key, (old) => upsert(old, question));
    };
    const onRemoved = ({ sessionId: id, questionId }: QuestionRemoved) => {
      if (id !== sessionId) return;
      queryClient.setQueryData<QuestionQueue>(
        key,
        (old) => old && { ...old, questions: old.questions.filter((q) => q.id !== questionId) },
      );
    };
    socket.on('connect', onConnect);
    socket.on('questions:changed', onChanged);
    socket.on('questions:removed', onRemoved);
    if (socket.connected) onConnect();
    return () => {
      socket.off('connect', onConnect);
      socket.off('questions:changed', onChanged);
      socket.off('questions:removed', onRemoved);
    };
  }, [socket, sessionId, queryClient]);

  const settle = useCallback(
    async (sending: () => Promise<Reply>, mark: 'mine' | 'meToos'): Promise<boolean> => {
      let reply: Reply;
      try {
        reply = await sending();
      } catch {
        setRefusal('No answer from the server: check your connection and try again.');
        return false;
      }
      if ('error' in reply) {
        setRefusal(refusalText(reply));
        return false;
      }
      setRefusal(null);
      const { question } = reply;
      queryClient.setQueryData<QuestionQueue>(questionsQueryOptions(sessionId).queryKey, (old) => {
        const next = upsert(old, question);
        return next && { ...next, [mark]: [...next[mark], question.id] };
      });
      return true;
    },
    [sessionId, queryClient],
  );

  // socket.io's timeout() flags the next emit, so it is called right before each one.
  const ask = (text: string) =>
    settle(
      () => socket.timeout(ackTimeoutMs).emitWithAck('questions:ask', { sessionId, text }),
      'mine',
    );
  const meToo = (questionId: string) =>
    settle(
      () => socket.timeout(ackTimeoutMs).emitWithAck('questions:meToo', { sessionId, questionId }),
      'meToos',
    );

  return { queue, refusal, ask, meToo };
}
