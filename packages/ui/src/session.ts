import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { meSchema, type Me } from '@vatside/contracts/account';
import type { StudioStanding } from '@vatside/contracts/roles';
import { ApiError, apiGet } from './api-client.ts';

/** Who is signed in; `null` for a visitor (401 is an answer here, not a failure). */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: ['me'],
    queryFn: async ({ signal }): Promise<Me | null> => {
      try {
        return await apiGet('/api/me', meSchema, { signal });
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) return null;
        throw error;
      }
    },
  });

export function useMe() {
  return useQuery(meQueryOptions());
}

/** The person's role in one studio, as far as the UI needs to know it. */
export function standingIn(me: Me | null | undefined, slug: string | undefined): StudioStanding {
  const membership = me?.memberships.find((m) => m.studio.slug === slug);
  return membership?.role ?? 'visitor';
}

/** After signing out or deleting the account: nothing cached belongs to anyone now. */
export function forgetSession(queryClient: QueryClient) {
  queryClient.setQueryData(meQueryOptions().queryKey, null);
  void queryClient.invalidateQueries({ predicate: (query) => query.queryKey[0] !== 'me' });
}
