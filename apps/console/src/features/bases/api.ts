import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  baseListSchema,
  baseSchema,
  potListSchema,
  potSchema,
  type BaseCreate,
  type BaseUpdate,
  type PotCreate,
  type PotUpdate,
} from '@vatside/contracts/workbench-bases';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi, withPage, type PageAt } from '../../lib/studio-path.ts';

const keys = {
  bases: (slug: string) => ['workbench', slug, 'bases'] as const,
  pots: (slug: string) => ['workbench', slug, 'pots'] as const,
};

export const basesQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...keys.bases(slug), page],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'bases'), page), baseListSchema, { signal }),
  });

export const potsQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...keys.pots(slug), page],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'pots'), page), potListSchema, { signal }),
  });

function useListMutation<V, R>(key: readonly unknown[], send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: key }),
  });
}

export const useCreateBase = (slug: string) =>
  useListMutation(keys.bases(slug), (base: BaseCreate) =>
    apiSend('POST', studioApi(slug, 'bases'), base, baseSchema),
  );

export const useUpdateBase = (slug: string) =>
  useListMutation(keys.bases(slug), ({ id, patch }: { id: string; patch: BaseUpdate }) =>
    apiSend('PATCH', studioApi(slug, 'bases', id), patch, baseSchema),
  );

export const useDeleteBase = (slug: string) =>
  useListMutation(keys.bases(slug), (baseId: string) =>
    apiSend('DELETE', studioApi(slug, 'bases', baseId)),
  );

export const useCreatePot = (slug: string) =>
  useListMutation(keys.pots(slug), (pot: PotCreate) =>
    apiSend('POST', studioApi(slug, 'pots'), pot, potSchema),
  );

export const useUpdatePot = (slug: string) =>
  useListMutation(keys.pots(slug), ({ id, patch }: { id: string; patch: PotUpdate }) =>
    apiSend('PATCH', studioApi(slug, 'pots', id), patch, potSchema),
  );

export const useDeletePot = (slug: string) =>
  useListMutation(keys.pots(slug), (potId: string) =>
    apiSend('DELETE', studioApi(slug, 'pots', potId)),
  );
