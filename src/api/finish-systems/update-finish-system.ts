import { useMutation, useQueryClient } from '@tanstack/react-query';
import { finishSystemResponseSchema, type UpdateFinishSystemInput } from '../../../shared/schemas/finish-system';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { finishSystemKeys } from './finish-system-keys';

export async function updateFinishSystem({ id, changes }: { id: number; changes: UpdateFinishSystemInput }) {
  const { finishSystem } = await apiClient.patch(`/api/finish-systems/${id}`, changes, finishSystemResponseSchema);
  return finishSystem;
}

export function useUpdateFinishSystem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFinishSystem,
    onSuccess: (system) => {
      queryClient.setQueryData(finishSystemKeys.detail(system.id), system);
      return invalidate(queryClient, changedKeys.finishSystem());
    },
  });
}
