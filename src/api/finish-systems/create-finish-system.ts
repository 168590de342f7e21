import { useMutation, useQueryClient } from '@tanstack/react-query';
import { finishSystemResponseSchema, type CreateFinishSystemInput } from '../../../shared/schemas/finish-system';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { finishSystemKeys } from './finish-system-keys';

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
      return invalidate(queryClient, changedKeys.finishSystem());
    },
  });
}
