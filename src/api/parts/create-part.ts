import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partResponseSchema, type CreatePartInput } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createPart({ jobId, input }: { jobId: number; input: CreatePartInput }) {
  const { part } = await apiClient.post(`/api/jobs/${jobId}/parts`, input, partResponseSchema);
  return part;
}

export function useCreatePart() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createPart, onSuccess: () => invalidate(queryClient, changedKeys.part()) });
}
