import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { Question, QuestionQueue } from '@vatside/contracts/questions';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { useCallback, useEffect, useState } from 'react';
import { questionQueueQueryOptions } from '../api.ts';
import { ackTimeoutMs, type LiveSocket } from '../socket.ts';

const upsert = (queue: QuestionQueue | undefined, question: Question) =>
  queue && {
    ...queue,
    questions: queue.questions.some((q) => q.id === question.id)
      ? queue.questions.map((q) => (q.id === question.id ? question : q))
      : [...queue.questions, question],
  };

/** The queue for the host and moderators: joined on every (re)connect, kept fresh by pushes. */
export function useQuestionQueue(socket: LiveSocket, sessionId: string) {
  const queryClient = useQueryClient();
  const { data: queue } = useQuery(questionQueueQueryOptions(sessionId));
  const [refusal, setRefusal] = useState<string | null>(null);

  useEffect(() => {
    const key = questionQueueQueryOptions(sessionId).queryKey;
    const onConnect = async () => {
      try {
        const reply = await socket
          .timeout(ackTimeoutMs)
          .emitWithAck('questions:join', { sessionId });
        if ('error' in reply) setRefusal(reply.error.message);
        else queryClient.setQueryData(key, reply);
      } catch {
        setRefusal('The questions did not load. They come back when the connection does.');
      }
    };
    const onChanged = (question: Question) => {
      if (question.sessionId === sessionId)
        queryClient.setQueryData<QuestionQueue>(key, (old) => upsert(old, question));
    };
    const connect = () => void onConnect();
    socket.on('connect', connect);
    socket.on('questions:changed', onChanged);
    if (socket.connected) connect();
    return () => {
      socket.off('connect', connect);
      socket.off('questions:changed', onChanged);
    };
  }, [socket, sessionId, queryClient]);

  const settle = useCallback(
    async (sending: () => Promise<{ question: Question } | RealtimeError>): Promise<boolean> => {
      let reply: { question: Question } | RealtimeError;
      try {
        reply = await sending();
      } catch {
        setRefusal('The server did not answer in time. Try again.');
        return false;
      }
      if ('error' in reply) {
        setRefusal(reply.error.message);
        return false;
      }
      setRefusal(null);
      queryClient.setQueryData<QuestionQueue>(
        questionQueueQueryOptions(sessionId).queryKey,
        (old) => upsert(old, reply.question),
      );
      return true;
    },
    [sessionId, queryClient],
  );

  // socket.io's timeout() flags the next emit, so it is called right before each one.
  const emit = () => socket.timeout(ackTimeoutMs);
  const answer = (questionId: string, text: string) =>
    settle(() => emit().emitWithAck('questions:answer', { sessionId, questionId, answer: text }));
  const hide = (questionId: string, hidden: boolean) =>
    settle(() => emit().emitWithAck('questions:hide', { sessionId, questionId, hidden }));
  const mute = (questionId: string, muted: boolean) =>
    settle(() => emit().emitWithAck('questions:mute', { sessionId, questionId, muted }));

  return { queue, refusal, answer, hide, mute };
}
