import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateFinishSystemInput } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { finishSystemKeys } from './finish-system-keys';
import { finishSystemResponseSchema } from './finish-system-response';

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
      return queryClient.invalidateQueries({ queryKey: finishSystemKeys.lists() });
    },
  });
}
