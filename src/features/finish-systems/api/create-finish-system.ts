import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateFinishSystemInput } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { finishSystemKeys } from './finish-system-keys';
import { finishSystemResponseSchema } from './finish-system-response';

export async function createFinishSystem(input: CreateFinishSystemInput) {
  const { finishSystem } = await apiClient.post('/api/finish-systems', input, finishSystemResponseSchema);
  return finishSystem;
}

export function useCreateFinishSystem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFinishSystem,
    onSuccess: (system) => {
      queryClient.setQueryData(finishSystemKeys.detail(system.id), system);
      return queryClient.invalidateQueries({ queryKey: finishSystemKeys.lists() });
    },
  });
}
