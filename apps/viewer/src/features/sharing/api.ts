import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { publicDyeAlongSchema } from '@vatside/contracts/dye-alongs';
import {
  SHARE_DETAILS_FIELD,
  SHARE_PHOTOS_FIELD,
  submissionListSchema,
  submissionSchema,
  type Submission,
  type SubmissionCreate,
  type SubmissionUpdate,
} from '@vatside/contracts/submissions';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { apiUpload } from '@vatside/ui/upload.ts';

const studioPath = (slug: string) => `/api/studios/${encodeURIComponent(slug)}`;
const minePath = (slug: string) => `${studioPath(slug)}/my-submissions`;
const onePath = (slug: string, id: string) => `${minePath(slug)}/${encodeURIComponent(id)}`;

/** The dye-along being shared for: its title, sharing window and the month's colorways. */
export const sharingDyeAlongQueryOptions = (slug: string, dyeAlongId: string) =>
  queryOptions({
    queryKey: ['dye-alongs', slug, dyeAlongId, 'public', 'sharing'],
    queryFn: ({ signal }) =>
      apiGet(
        `${studioPath(slug)}/dye-alongs/${encodeURIComponent(dyeAlongId)}/public`,
        publicDyeAlongSchema,
        { signal },
      ),
  });

/** My skeins in one studio, newest first (the server caps a page at 100). */
export const mySkeinsQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: ['my-skeins', slug],
    queryFn: ({ signal }) =>
      apiGet(`${minePath(slug)}?limit=100`, submissionListSchema, { signal }),
  });

export interface ShareRequest {
  photos: File[];
  details: SubmissionCreate;
  onProgress: (fraction: number) => void;
}

/** One multipart request: the photos and the details as JSON, with upload progress. */
export function useShareSkein(slug: string, dyeAlongId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ photos, details, onProgress }: ShareRequest) => {
      const form = new FormData();
      form.append(SHARE_DETAILS_FIELD, JSON.stringify(details));
      for (const photo of photos) form.append(SHARE_PHOTOS_FIELD, photo, photo.name);
      return apiUpload(
        `${studioPath(slug)}/dye-alongs/${encodeURIComponent(dyeAlongId)}/submissions`,
        form,
        submissionSchema,
        onProgress,
      );
    },
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: mySkeinsQueryOptions(slug).queryKey }),
  });
}

/** Edits, consent and withdrawal each refresh the list. */
function useSkeinChange<V, R>(slug: string, send: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: mySkeinsQueryOptions(slug).queryKey }),
  });
}

export function useUpdateSkein(slug: string) {
  return useSkeinChange(slug, ({ id, patch }: { id: string; patch: SubmissionUpdate }) =>
    apiSend('PATCH', onePath(slug, id), patch, submissionSchema),
  );
}

export function useSetConsent(slug: string) {
  return useSkeinChange(
    slug,
    ({ id, consentToFeature }: { id: string; consentToFeature: boolean }) =>
      apiSend('PUT', `${onePath(slug, id)}/consent`, { consentToFeature }, submissionSchema),
  );
}

export function useWithdrawSkein(slug: string) {
  return useSkeinChange(slug, (skein: Pick<Submission, 'id'>) =>
    apiSend('DELETE', onePath(slug, skein.id)),
  );
}
