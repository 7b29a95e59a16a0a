import { queryOptions, skipToken } from '@tanstack/react-query';
import type { LiveState } from '@vatside/contracts/live';
import { liveProgramSchema } from '@vatside/contracts/live-program';
import type { QuestionQueue } from '@vatside/contracts/questions';
import { apiGet } from '@vatside/ui/api-client.ts';

/** The run sheets of a session: fixed when it starts, so fetched once. */
export const liveProgramQueryOptions = (sessionId: string) =>
  queryOptions({
    queryKey: ['live', 'program', sessionId],
    queryFn: ({ signal }) =>
      apiGet(`/api/live-sessions/${encodeURIComponent(sessionId)}/program`, liveProgramSchema, {
        signal,
      }),
    staleTime: Infinity,
  });

/**
 * The session's state as the socket last delivered it. Nothing fetches it: the join snapshot and
 * `live:state` pushes write it into the cache (see hooks/use-live-session.ts).
 */
export const liveStateQueryOptions = (sessionId: string) =>
  queryOptions<LiveState>({
    queryKey: ['live', 'state', sessionId],
    queryFn: skipToken,
    staleTime: Infinity,
  });

/**
 * The question queue as this person may see it. Nothing fetches it: `questions:join` answers
 * with it and the server's pushes update it (see hooks/use-questions.ts).
 */
export const questionsQueryOptions = (sessionId: string) =>
  queryOptions<QuestionQueue>({
    queryKey: ['live', 'session', sessionId, 'questions'],
    queryFn: skipToken,
    staleTime: Infinity,
  });
