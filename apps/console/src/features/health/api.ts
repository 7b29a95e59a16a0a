import { queryOptions } from '@tanstack/react-query';
import { healthSchema } from '@vatside/contracts/health';
import { apiGet } from '@vatside/ui/api-client.ts';

export const healthQueryOptions = () =>
  queryOptions({
    queryKey: ['health'],
    // A degraded server may answer 503 with the same report; that report is what we show.
    queryFn: ({ signal }) => apiGet('/api/health', healthSchema, { signal, acceptStatus: [503] }),
    staleTime: 0,
  });
