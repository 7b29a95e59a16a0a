import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  archiveListSchema,
  archivedColorwayDetailSchema,
  bathRecordListSchema,
  bathRecordSchema,
  dyeAgainSchema,
  type BathRecordInput,
} from '@vatside/contracts/archive';
import { imageListSchema } from '@vatside/contracts/workbench-images';
import type { MeasureSystem } from '@vatside/dye-kit';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi } from '../../lib/studio-path.ts';

const archiveKey = (slug: string) => ['archive', slug] as const;

/** What the archive screen searches by; empty fields are left out of the query. */
export interface ArchiveSearch {
  month?: string;
  hex?: string;
  baseId?: string;
  dyeId?: string;
}

const queryString = (params: Record<string, string | number | undefined>) =>
  new URLSearchParams(
    Object.entries(params).flatMap(([k, v]) =>
      v === undefined || v === '' ? [] : [[k, String(v)]],
    ),
  ).toString();

export const archiveSearchQueryOptions = (slug: string, search: ArchiveSearch) =>
  queryOptions({
    queryKey: [...archiveKey(slug), 'search', search],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'archive')}?${queryString({ ...search, limit: 100 })}`,
        archiveListSchema,
        { signal },
      ),
  });

export const archivedColorwayQueryOptions = (slug: string, archivedColorwayId: string) =>
  queryOptions({
    queryKey: [...archiveKey(slug), 'detail', archivedColorwayId],
    queryFn: ({ signal }) =>
      apiGet(studioApi(slug, 'archive', archivedColorwayId), archivedColorwayDetailSchema, {
        signal,
      }),
  });

export interface DyeAgainChoice {
  baseId: string;
  skeins: number;
  potId?: string;
  system: MeasureSystem;
}

export const dyeAgainQueryOptions = (
  slug: string,
  archivedColorwayId: string,
  choice: DyeAgainChoice,
) =>
  queryOptions({
    queryKey: [...archiveKey(slug), 'detail', archivedColorwayId, 'dye-again', choice],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'archive', archivedColorwayId, 'dye-again')}?${queryString({ ...choice })}`,
        dyeAgainSchema,
        { signal },
      ),
  });

const bathRecordsKey = (slug: string, dyeAlongId: string) =>
  [...archiveKey(slug), 'bath-records', dyeAlongId] as const;

export const bathRecordsQueryOptions = (slug: string, dyeAlongId: string) =>
  queryOptions({
    queryKey: bathRecordsKey(slug, dyeAlongId),
    queryFn: ({ signal }) =>
      apiGet(studioApi(slug, 'dye-alongs', dyeAlongId, 'bath-records'), bathRecordListSchema, {
        signal,
      }),
  });

/** Saves one colorway's bath record; the archive's copies refresh with it. */
export function useSaveBathRecord(slug: string, dyeAlongId: string, colorwayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BathRecordInput) =>
      apiSend(
        'PUT',
        studioApi(slug, 'dye-alongs', dyeAlongId, 'bath-records', colorwayId),
        body,
        bathRecordSchema,
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: archiveKey(slug) }),
  });
}

/** The colorway's photos on the workbench, to pick for its bath record. */
export const colorwayPhotosQueryOptions = (slug: string, colorwayId: string) =>
  queryOptions({
    queryKey: ['workbench', slug, 'images', 'colorwayPhoto', colorwayId],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioApi(slug, 'images')}?purpose=colorwayPhoto&colorwayId=${colorwayId}&limit=100`,
        imageListSchema,
        { signal },
      ),
  });
