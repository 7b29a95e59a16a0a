import { queryOptions, skipToken, useMutation, useQueryClient } from '@tanstack/react-query';
import { dyeAlongListSchema, type DyeAlong } from '@vatside/contracts/dye-alongs';
import { sessionDyeLogSchema } from '@vatside/contracts/dye-log';
import type { LiveState } from '@vatside/contracts/live';
import { currentLiveSchema } from '@vatside/contracts/live-now';
import { liveProgramSchema, liveSessionStartedSchema } from '@vatside/contracts/live-program';
import type { QuestionQueue } from '@vatside/contracts/questions';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi } from '../../lib/studio-path.ts';

const liveKey = (slug: string) => ['live', slug] as const;

/** Dye-alongs a session can start from: drafts (rehearsal only), announced and live ones. */
const startableStatuses = ['announced', 'live', 'draft'] as const;

export const startableDyeAlongsQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: [...liveKey(slug), 'startable'],
    queryFn: async ({ signal }): Promise<DyeAlong[]> => {
      // One request per status keeps this month's dye-along in view however long the history.
      const lists = await Promise.all(
        startableStatuses.map((status) =>
          apiGet(
            `${studioApi(slug, 'dye-alongs')}?status=${status}&limit=100`,
            dyeAlongListSchema,
            { signal },
          ),
        ),
      );
      return lists
        .flatMap((list) => list.items)
        .sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));
    },
  });

/** The studio's running public session, if any (rehearsals are never listed). */
export const currentLiveQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: [...liveKey(slug), 'current'],
    queryFn: ({ signal }) => apiGet(studioApi(slug, 'live'), currentLiveSchema, { signal }),
  });

/** The run sheets of a session: fixed when it starts, so fetched once. */
export const liveProgramQueryOptions = (sessionId: string) =>
  queryOptions({
    queryKey: ['live-session', sessionId, 'program'],
    queryFn: ({ signal }) =>
      apiGet(`/api/live-sessions/${encodeURIComponent(sessionId)}/program`, liveProgramSchema, {
        signal,
      }),
    staleTime: Infinity,
  });

/**
 * The session's state as the socket last delivered it. Nothing fetches it: the join snapshot,
 * action replies and `live:state` pushes write it (see hooks/use-host-session.ts).
 */
export const liveStateQueryOptions = (sessionId: string) =>
  queryOptions<LiveState>({
    queryKey: ['live-session', sessionId, 'state'],
    queryFn: skipToken,
    staleTime: Infinity,
  });

/** How many phones follow the session; pushed by the server to the host. */
export const liveViewersQueryOptions = (sessionId: string) =>
  queryOptions<number>({
    queryKey: ['live-session', sessionId, 'viewers'],
    queryFn: skipToken,
    staleTime: Infinity,
  });

export type StartMode = 'live' | 'rehearsal';

export function useStartSession(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ dyeAlongId, mode }: { dyeAlongId: string; mode: StartMode }) =>
      apiSend(
        'POST',
        studioApi(slug, 'dye-alongs', dyeAlongId, 'live-sessions'),
        { mode },
        liveSessionStartedSchema,
      ),
    // Going live moves the dye-along on and opens a running session.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: liveKey(slug) }),
  });
}

/** The viewer app's follow-along, as the server's `viewerPath` names it. */
export const viewerPathOf = (sessionId: string) => `/live/${encodeURIComponent(sessionId)}`;

/** The session's dye log (plan to prefill from, and every entry); refreshed on `dyeLog:changed`. */
export const dyeLogQueryOptions = (sessionId: string) =>
  queryOptions({
    queryKey: ['live-session', sessionId, 'dye-log'],
    queryFn: ({ signal }) =>
      apiGet(`/api/live-sessions/${encodeURIComponent(sessionId)}/dye-log`, sessionDyeLogSchema, {
        signal,
      }),
  });

/**
 * The question queue as the staff see it. Nothing fetches it: `questions:join` answers with it
 * and `questions:changed` pushes update it (see hooks/use-question-queue.ts).
 */
export const questionQueueQueryOptions = (sessionId: string) =>
  queryOptions<QuestionQueue>({
    queryKey: ['live-session', sessionId, 'questions'],
    queryFn: skipToken,
    staleTime: Infinity,
  });
