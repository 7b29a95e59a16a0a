import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import { gallerySchema, gallerySkeinSchema } from '@vatside/contracts/gallery';
import { apiGet } from '@vatside/ui/api-client.ts';

/** Skeins per page: two screens of a phone's three-across grid. */
export const GALLERY_PAGE_SIZE = 24;

const galleryPath = (slug: string, dyeAlongId: string) =>
  `/api/studios/${encodeURIComponent(slug)}/dye-alongs/${encodeURIComponent(dyeAlongId)}/gallery`;

/** The month's public gallery, page by page; `colorwayId` narrows it to one colorway. */
export const galleryQueryOptions = (slug: string, dyeAlongId: string, colorwayId: string | null) =>
  infiniteQueryOptions({
    queryKey: ['gallery', slug, dyeAlongId, { colorwayId }],
    initialPageParam: 0,
    queryFn: ({ pageParam, signal }) => {
      const query = new URLSearchParams({
        limit: String(GALLERY_PAGE_SIZE),
        offset: String(pageParam),
      });
      if (colorwayId) query.set('colorwayId', colorwayId);
      return apiGet(`${galleryPath(slug, dyeAlongId)}?${query}`, gallerySchema, { signal });
    },
    getNextPageParam: ({ page, items }) => {
      const next = page.offset + items.length;
      return items.length > 0 && next < page.total ? next : undefined;
    },
  });

/** One skein of the gallery, at its own address. */
export const gallerySkeinQueryOptions = (slug: string, dyeAlongId: string, skeinId: string) =>
  queryOptions({
    queryKey: ['gallery', slug, dyeAlongId, 'skein', skeinId],
    queryFn: ({ signal }) =>
      apiGet(
        `${galleryPath(slug, dyeAlongId)}/${encodeURIComponent(skeinId)}`,
        gallerySkeinSchema,
        { signal },
      ),
  });

export const galleryPagePath = (slug: string, dyeAlongId: string) =>
  `/s/${slug}/dye-alongs/${dyeAlongId}/gallery`;
