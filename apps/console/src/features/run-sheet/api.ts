import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  stepListSchema,
  stepSchema,
  type StepCreate,
  type StepList,
  type StepUpdate,
} from '@vatside/contracts/workbench-colorways';
import { apiGet, apiSend } from '@vatside/ui/api-client.ts';
import { studioApi } from '../../lib/studio-path.ts';

const stepsPath = (slug: string, colorwayId: string, ...rest: string[]) =>
  studioApi(slug, 'colorways', colorwayId, 'steps', ...rest);

export const stepsQueryOptions = (slug: string, colorwayId: string) =>
  queryOptions({
    queryKey: ['workbench', slug, 'colorways', 'steps', colorwayId],
    queryFn: ({ signal }) => apiGet(stepsPath(slug, colorwayId), stepListSchema, { signal }),
  });

export function useCreateStep(slug: string, colorwayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (step: StepCreate) =>
      apiSend('POST', stepsPath(slug, colorwayId), step, stepSchema),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: stepsQueryOptions(slug, colorwayId).queryKey }),
  });
}

/** Changes a step in place: its place in the run sheet and the live program's pointers stay. */
export function useUpdateStep(slug: string, colorwayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: StepUpdate }) =>
      apiSend('PATCH', stepsPath(slug, colorwayId, id), patch, stepSchema),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: stepsQueryOptions(slug, colorwayId).queryKey }),
  });
}

export function useDeleteStep(slug: string, colorwayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stepId: string) =>
      apiSend('DELETE', stepsPath(slug, colorwayId, stepId), undefined, stepListSchema),
    onSuccess: (list) =>
      queryClient.setQueryData(stepsQueryOptions(slug, colorwayId).queryKey, list),
  });
}

/** Shows the new order at once; puts the old one back if the server refuses. */
export function useReorderSteps(slug: string, colorwayId: string) {
  const queryClient = useQueryClient();
  const { queryKey } = stepsQueryOptions(slug, colorwayId);
  return useMutation({
    mutationFn: (stepIds: string[]) =>
      apiSend('PUT', stepsPath(slug, colorwayId, 'order'), { stepIds }, stepListSchema),
    onMutate: async (stepIds) => {
      await queryClient.cancelQueries({ queryKey });
      const before = queryClient.getQueryData(queryKey);
      if (before) {
        const byId = new Map(before.steps.map((s) => [s.id, s]));
        const steps = stepIds.flatMap((id) => byId.get(id) ?? []);
        queryClient.setQueryData<StepList>(queryKey, { steps });
      }
      return { before };
    },
    onError: (_error, _ids, context) => {
      if (context?.before) queryClient.setQueryData(queryKey, context.before);
    },
    onSuccess: (list) => queryClient.setQueryData(queryKey, list),
  });
}
