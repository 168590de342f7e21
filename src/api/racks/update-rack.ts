import { useMutation, useQueryClient } from '@tanstack/react-query';
import { rackResponseSchema, type UpdateRackInput } from '../../../shared/schemas/rack';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function updateRack({ id, changes }: { id: number; changes: UpdateRackInput }) {
  const { rack } = await apiClient.patch(`/api/racks/${id}`, changes, rackResponseSchema);
  return rack;
}

export function useUpdateRack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRack,
    onSuccess: () => invalidate(queryClient, changedKeys.rack()),
  });
}
