import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  imageListSchema,
  imageSchema,
  type PaletteEdit,
  type PalettePick,
} from '@vatside/contracts/workbench-images';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { apiUpload } from '@vatside/ui/upload.ts';
import { studioApi, withPage, type PageAt } from '../../lib/studio-path.ts';

const imagesKey = (slug: string) => ['workbench', slug, 'images'] as const;

export const inspirationImagesQueryOptions = (slug: string, page: PageAt) =>
  queryOptions({
    queryKey: [...imagesKey(slug), 'inspiration', page],
    queryFn: ({ signal }) =>
      apiGet(`${withPage(studioApi(slug, 'images'), page)}&purpose=inspiration`, imageListSchema, {
        signal,
      }),
  });

function useImageMutation<V, R>(slug: string, send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: imagesKey(slug) }),
  });
}

/** Sends the file through the server's upload pipeline; `onProgress` gets 0…1. */
export const useUploadInspiration = (slug: string, onProgress: (fraction: number) => void) =>
  useImageMutation(slug, (file: File) => {
    const form = new FormData();
    form.append('purpose', 'inspiration');
    form.append('image', file);
    return apiUpload(studioApi(slug, 'images'), form, imageSchema, onProgress);
  });

export const useDeleteImage = (slug: string) =>
  useImageMutation(slug, (imageId: string) =>
    apiSend('DELETE', studioApi(slug, 'images', imageId)),
  );

export const useEditPalette = (slug: string, imageId: string) =>
  useImageMutation(slug, (edit: PaletteEdit) =>
    apiSend('PUT', studioApi(slug, 'images', imageId, 'palette'), edit, imageSchema),
  );

export const usePickSwatch = (slug: string, imageId: string) =>
  useImageMutation(slug, (pick: PalettePick) =>
    apiSend('POST', studioApi(slug, 'images', imageId, 'palette', 'pick'), pick, imageSchema),
  );
