import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  colorwayDetailSchema,
  colorwayListSchema,
  colorwaySummarySchema,
  computedAmountsSchema,
  type ColorwayCreate,
  type ColorwayUpdate,
} from '@vatside/contracts/workbench-colorways';
import type { MeasureSystem } from '@vatside/dye-kit';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi, withPage, type PageAt } from '../../lib/studio-path.ts';

const colorwaysKey = (slug: string) => ['workbench', slug, 'colorways'] as const;

export const colorwaysQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...colorwaysKey(slug), 'list', page],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'colorways'), page), colorwayListSchema, { signal }),
  });

/** The colorway with the server's amounts for the host's skeins, in `system`'s kitchen measures. */
export const colorwayQueryOptions = (slug: string, colorwayId: string, system: MeasureSystem) =>
  queryOptions({
    queryKey: [...colorwaysKey(slug), 'detail', colorwayId, system],
    queryFn: ({ signal }) =>
      apiGet(`${studioApi(slug, 'colorways', colorwayId)}?system=${system}`, colorwayDetailSchema, {
        signal,
      }),
  });

/** The same recipe worked out for another skein weight. */
export const amountsQueryOptions = (
  slug: string,
  colorwayId: string,
  weightOfGoodsG: number,
  system: MeasureSystem,
) =>
  queryOptions({
    queryKey: [...colorwaysKey(slug), 'detail', colorwayId, 'amounts', weightOfGoodsG, system],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'colorways', colorwayId, 'amounts')}?weightOfGoodsG=${weightOfGoodsG}&system=${system}`,
        computedAmountsSchema,
        { signal },
      ),
  });

function useColorwayMutation<V, R>(slug: string, send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: colorwaysKey(slug) }),
  });
}

export const useCreateColorway = (slug: string) =>
  useColorwayMutation(slug, (colorway: ColorwayCreate) =>
    apiSend('POST', studioApi(slug, 'colorways'), colorway, colorwaySummarySchema),
  );

export const useUpdateColorway = (slug: string, colorwayId: string) =>
  useColorwayMutation(slug, (patch: ColorwayUpdate) =>
    apiSend('PATCH', studioApi(slug, 'colorways', colorwayId), patch, colorwaySummarySchema),
  );

export const useDeleteColorway = (slug: string) =>
  useColorwayMutation(slug, (colorwayId: string) =>
    apiSend('DELETE', studioApi(slug, 'colorways', colorwayId)),
  );
