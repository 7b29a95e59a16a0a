import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { meOrVisitorSchema, type Me } from '@vatside/contracts/account';
import type { StudioStanding } from '@vatside/contracts/roles';
import { apiGet } from './api-client.ts';

/** Who is signed in; `null` for a visitor. */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: ['me'],
    queryFn: ({ signal }): Promise<Me | null> => apiGet('/api/me', meOrVisitorSchema, { signal }),
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
