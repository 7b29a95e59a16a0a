import { useQuery } from '@tanstack/react-query';
import { pickerPage } from '../../lib/studio-path.ts';
import { colorwaysQueryOptions } from '../../features/colorways/api.ts';
import { inspirationImagesQueryOptions } from '../../features/inspiration/api.ts';

/** What the dye-along form picks from: the studio's colorways and inspiration images. */
export function useDyeAlongChoices(slug: string) {
  const colorways = useQuery(colorwaysQueryOptions(slug, pickerPage));
  const images = useQuery(inspirationImagesQueryOptions(slug, pickerPage));
  return {
    colorways: colorways.data?.items,
    images: images.data?.items,
    error: colorways.error ?? images.error,
    retry: () => {
      void colorways.refetch();
      void images.refetch();
    },
  };
}
