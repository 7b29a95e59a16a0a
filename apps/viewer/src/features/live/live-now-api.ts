import { queryOptions } from '@tanstack/react-query';
import { currentLiveSchema } from '@vatside/contracts/live-now';
import { apiGet } from '@vatside/ui/api-client.ts';

// Apart from the live screen's own API: a studio's page loads only this.

/** How often a studio page or the waiting screen asks whether a session has started. */
const liveCheckEveryMs = 20_000;

/** The studio's running public session, or `{ live: null }`. */
export const studioLiveQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['live', 'studio', slug],
    queryFn: ({ signal }) =>
      apiGet(`/api/studios/${encodeURIComponent(slug)}/live`, currentLiveSchema, { signal }),
    refetchInterval: liveCheckEveryMs,
  });
