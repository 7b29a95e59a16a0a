import { queryOptions } from '@tanstack/react-query';
import { dyeAlongListSchema, publicDyeAlongSchema } from '@vatside/contracts/dye-alongs';
import type { MeasureSystem } from '@vatside/dye-kit';
import { apiGet } from '@vatside/ui/api-client.ts';

const dyeAlongsPath = (slug: string) => `/api/studios/${encodeURIComponent(slug)}/dye-alongs`;

/** Whose page it is: the skein and measures the amounts are for, and the clock to read. */
export type Reader = { weightOfGoodsG: number; system: MeasureSystem; timeZone: string };

/** The viewer's page of one dye-along, worked out for the reader's skein. */
export const publicDyeAlongQueryOptions = (slug: string, dyeAlongId: string, reader: Reader) =>
  queryOptions({
    queryKey: ['dye-alongs', slug, dyeAlongId, 'public', reader],
    queryFn: ({ signal }) => {
      const query = new URLSearchParams({
        weightOfGoodsG: String(reader.weightOfGoodsG),
        system: reader.system,
        timeZone: reader.timeZone,
      });
      return apiGet(
        `${dyeAlongsPath(slug)}/${encodeURIComponent(dyeAlongId)}/public?${query}`,
        publicDyeAlongSchema,
        { signal },
      );
    },
  });

/** The studio's announced dye-alongs, soonest first; the studio page links the first. */
export const announcedDyeAlongsQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['dye-alongs', slug, 'announced'],
    queryFn: ({ signal }) =>
      apiGet(`${dyeAlongsPath(slug)}?status=announced&limit=5`, dyeAlongListSchema, { signal }),
  });
