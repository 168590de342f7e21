import { useMutation, useQueryClient } from '@tanstack/react-query';
import { rackResponseSchema, type CreateRackInput } from '../../../shared/schemas/rack';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createRack(input: CreateRackInput) {
  const { rack } = await apiClient.post('/api/racks', input, rackResponseSchema);
  return rack;
}

export function useCreateRack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRack,
    onSuccess: () => invalidate(queryClient, changedKeys.rack()),
  });
}
