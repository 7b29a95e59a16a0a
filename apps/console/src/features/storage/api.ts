import { queryOptions } from '@tanstack/react-query';
import { studioStorageSchema } from '@vatside/contracts/storage';
import { apiGet } from '@vatside/ui/api-client.ts';

/** What the studio keeps in the object store (hosts only). */
export const storageQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['studios', 'storage', slug],
    queryFn: ({ signal }) =>
      apiGet(`/api/studios/${encodeURIComponent(slug)}/storage`, studioStorageSchema, { signal }),
  });
