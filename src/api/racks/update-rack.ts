import { useMutation, useQueryClient } from '@tanstack/react-query';
import { rackResponseSchema, type UpdateRackInput } from '../../../shared/schemas/rack';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { rackKeys } from './rack-keys';

export async function updateRack({ id, changes }: { id: number; changes: UpdateRackInput }) {
  const { rack } = await apiClient.patch(`/api/racks/${id}`, changes, rackResponseSchema);
  return rack;
}

export function useUpdateRack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRack,
    onSuccess: (rack) => {
      queryClient.setQueryData(rackKeys.detail(rack.id), rack);
      return invalidate(queryClient, changedKeys.rack());
    },
  });
}
