import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  dyeListSchema,
  dyeSchema,
  stockSolutionDetailSchema,
  stockSolutionListSchema,
  stockSolutionSchema,
  type DyeCreate,
  type DyeUpdate,
  type StockAdjustmentCreate,
  type StockSolutionCreate,
  type StockSolutionUpdate,
} from '@vatside/contracts/workbench-shelf';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi, withPage, type PageAt } from '../../lib/studio-path.ts';

const keys = {
  dyes: (slug: string) => ['workbench', slug, 'dyes'] as const,
  stocks: (slug: string) => ['workbench', slug, 'stock-solutions'] as const,
};

export const dyesQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...keys.dyes(slug), page],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'dyes'), page), dyeListSchema, { signal }),
  });

export const stockSolutionsQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...keys.stocks(slug), page],
    queryFn: ({ signal }) =>
      apiGet(withPage(studioApi(slug, 'stock-solutions'), page), stockSolutionListSchema, {
        signal,
      }),
  });

/** One jar with its adjustment history. */
export const stockSolutionQueryOptions = (slug: string, stockId: string) =>
  queryOptions({
    queryKey: [...keys.stocks(slug), 'detail', stockId],
    queryFn: ({ signal }) =>
      apiGet(studioApi(slug, 'stock-solutions', stockId), stockSolutionDetailSchema, { signal }),
  });

function useShelfMutation<V, R>(slug: string, send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    // Dyes and jars show each other's names, so both lists refresh.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: keys.dyes(slug) }),
        queryClient.invalidateQueries({ queryKey: keys.stocks(slug) }),
      ]),
  });
}

export const useCreateDye = (slug: string) =>
  useShelfMutation(slug, (dye: DyeCreate) =>
    apiSend('POST', studioApi(slug, 'dyes'), dye, dyeSchema),
  );

export const useUpdateDye = (slug: string) =>
  useShelfMutation(slug, ({ id, patch }: { id: string; patch: DyeUpdate }) =>
    apiSend('PATCH', studioApi(slug, 'dyes', id), patch, dyeSchema),
  );

export const useDeleteDye = (slug: string) =>
  useShelfMutation(slug, (dyeId: string) => apiSend('DELETE', studioApi(slug, 'dyes', dyeId)));

export const useCreateStockSolution = (slug: string) =>
  useShelfMutation(slug, (stock: StockSolutionCreate) =>
    apiSend('POST', studioApi(slug, 'stock-solutions'), stock, stockSolutionSchema),
  );

export const useUpdateStockSolution = (slug: string) =>
  useShelfMutation(slug, ({ id, patch }: { id: string; patch: StockSolutionUpdate }) =>
    apiSend('PATCH', studioApi(slug, 'stock-solutions', id), patch, stockSolutionSchema),
  );

export const useDeleteStockSolution = (slug: string) =>
  useShelfMutation(slug, (stockId: string) =>
    apiSend('DELETE', studioApi(slug, 'stock-solutions', stockId)),
  );

export const useAdjustStock = (slug: string, stockId: string) =>
  useShelfMutation(slug, (adjustment: StockAdjustmentCreate) =>
    apiSend(
      'POST',
      studioApi(slug, 'stock-solutions', stockId, 'adjustments'),
      adjustment,
      stockSolutionDetailSchema,
    ),
  );
