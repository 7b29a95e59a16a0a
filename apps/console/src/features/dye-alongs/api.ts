import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { prepChecklistSchema, supplyListSchema } from '@vatside/contracts/dye-along-supplies';
import {
  dyeAlongDetailSchema,
  dyeAlongListSchema,
  type DyeAlongCreate,
  type DyeAlongStatus,
  type DyeAlongUpdate,
} from '@vatside/contracts/dye-alongs';
import type { MeasureSystem } from '@vatside/dye-kit';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { z } from 'zod';
import { studioApi } from '../../lib/studio-path.ts';

const dyeAlongsKey = (slug: string) => ['dye-alongs', slug] as const;

/** The month's dye-alongs (`2026-12`), the month read on `timeZone`'s calendar. */
export const dyeAlongMonthQueryOptions = (slug: string, month: string, timeZone: string) =>
  queryOptions({
    queryKey: [...dyeAlongsKey(slug), 'month', month, timeZone],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'dye-alongs')}?month=${month}&timeZone=${encodeURIComponent(timeZone)}&limit=100`,
        dyeAlongListSchema,
        { signal },
      ),
  });

/** The host's view: the dye-along, the moves it may make next, and its e-mails so far. */
export const dyeAlongQueryOptions = (slug: string, dyeAlongId: string) =>
  queryOptions({
    queryKey: [...dyeAlongsKey(slug), 'detail', dyeAlongId],
    queryFn: ({ signal }) =>
      apiGet(studioApi(slug, 'dye-alongs', dyeAlongId), dyeAlongDetailSchema, { signal }),
  });

// The supply-list route answers with both lists (no shared schema for the pair yet).
const suppliesAnswerSchema = z.object({
  supplyList: supplyListSchema,
  prepChecklist: prepChecklistSchema,
});

export type SupplyTarget = { scope: 'hostBatch' } | { scope: 'perSkein'; weightOfGoodsG: number };

/** The supply list and prep checklist for the host's batch or one skein of a given weight. */
export const suppliesQueryOptions = (
  slug: string,
  dyeAlongId: string,
  target: SupplyTarget,
  system: MeasureSystem,
) => {
  const weight = target.scope === 'perSkein' ? `&weightOfGoodsG=${target.weightOfGoodsG}` : '';
  return queryOptions({
    queryKey: [...dyeAlongsKey(slug), 'detail', dyeAlongId, 'supplies', target, system],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'dye-alongs', dyeAlongId, 'supply-list')}?scope=${target.scope}${weight}&system=${system}`,
        suppliesAnswerSchema,
        { signal },
      ),
  });
};

function useDyeAlongMutation<V, R>(slug: string, send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: dyeAlongsKey(slug) }),
  });
}

export const useCreateDyeAlong = (slug: string) =>
  useDyeAlongMutation(slug, (body: DyeAlongCreate) =>
    apiSend('POST', studioApi(slug, 'dye-alongs'), body, dyeAlongDetailSchema),
  );

export const useUpdateDyeAlong = (slug: string, dyeAlongId: string) =>
  useDyeAlongMutation(slug, (patch: DyeAlongUpdate) =>
    apiSend('PATCH', studioApi(slug, 'dye-alongs', dyeAlongId), patch, dyeAlongDetailSchema),
  );

export const useMoveDyeAlong = (slug: string, dyeAlongId: string) =>
  useDyeAlongMutation(slug, (to: DyeAlongStatus) =>
    apiSend(
      'POST',
      studioApi(slug, 'dye-alongs', dyeAlongId, 'transitions'),
      { to },
      dyeAlongDetailSchema,
    ),
  );
