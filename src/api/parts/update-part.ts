import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partResponseSchema, type UpdatePartInput } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { partKeys } from './part-keys';

export async function updatePart({ id, changes }: { id: number; changes: UpdatePartInput }) {
  const { part } = await apiClient.patch(`/api/parts/${id}`, changes, partResponseSchema);
  return part;
}

export function useUpdatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePart,
    onSuccess: (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      return invalidate(queryClient, changedKeys.part());
    },
  });
}
