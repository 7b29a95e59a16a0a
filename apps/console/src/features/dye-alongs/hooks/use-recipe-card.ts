import { useQueries } from '@tanstack/react-query';
import type { ColorwayBath, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { MeasureSystem } from '@vatside/dye-kit';
import { suppliesQueryOptions } from '../api.ts';

/** The skein weights a recipe card lists beside the host's own (common skein and mini sizes). */
export const cardWeightsG = [50, 100, 115, 150] as const;

export type ScaledBath = { weightOfGoodsG: number; bath: ColorwayBath | undefined };

export type RecipeCardData = {
  hostBatch: SupplyList;
  hostBath: ColorwayBath | undefined;
  scaled: ScaledBath[];
};

/**
 * One colorway's amounts for the host's batch and for each card weight, all worked out by the
 * server's supply list so the card and the viewer's page agree to the drop.
 */
export function useRecipeCard(
  slug: string,
  dyeAlongId: string,
  colorwayId: string,
  system: MeasureSystem,
) {
  return useQueries({
    queries: [
      suppliesQueryOptions(slug, dyeAlongId, { scope: 'hostBatch' }, system),
      ...cardWeightsG.map((weightOfGoodsG) =>
        suppliesQueryOptions(slug, dyeAlongId, { scope: 'perSkein', weightOfGoodsG }, system),
      ),
    ],
    combine: (results) => {
      const failed = results.find((r) => r.isError);
      const [host, ...others] = results;
      const bathOf = (list: SupplyList | undefined) =>
        list?.colorways.find((c) => c.colorwayId === colorwayId);
      const data: RecipeCardData | undefined =
        host?.data && others.every((r) => r.data)
          ? {
              hostBatch: host.data.supplyList,
              hostBath: bathOf(host.data.supplyList),
              scaled: cardWeightsG.map((weightOfGoodsG, i) => ({
                weightOfGoodsG,
                bath: bathOf(others[i]?.data?.supplyList),
              })),
            }
          : undefined;
      return {
        data,
        error: failed?.error ?? null,
        retry: () => results.forEach((r) => void r.refetch()),
      };
    },
  });
}
