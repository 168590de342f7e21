import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreatePartInput } from '../../../../shared/schemas/part';
import { apiClient } from '../../../lib/api-client';
import { partResponseSchema } from './get-part';
import { partKeys } from './part-keys';

export async function createPart({ jobId, input }: { jobId: number; input: CreatePartInput }) {
  const { part } = await apiClient.post(`/api/jobs/${jobId}/parts`, input, partResponseSchema);
  return part;
}

export function useCreatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPart,
    onSuccess: (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      return queryClient.invalidateQueries({ queryKey: partKeys.list(part.jobId) });
    },
  });
}
