import { queryOptions } from '@tanstack/react-query';
import { studioListSchema } from '@vatside/contracts/studios';
import { apiGet } from '../../lib/api-client.ts';

export const studiosQueryOptions = () =>
  queryOptions({
    queryKey: ['studios', 'list'],
    queryFn: ({ signal }) => apiGet('/api/studios', studioListSchema, { signal }),
  });
