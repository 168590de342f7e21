import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateRackInput } from '../../../../shared/schemas/rack';
import { apiClient } from '../../../lib/api-client';
import { rackResponseSchema } from './get-rack';
import { rackKeys } from './rack-keys';

export async function createRack(input: CreateRackInput) {
  const { rack } = await apiClient.post('/api/racks', input, rackResponseSchema);
  return rack;
}

export function useCreateRack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRack,
    onSuccess: (rack) => {
      queryClient.setQueryData(rackKeys.detail(rack.id), rack);
      return queryClient.invalidateQueries({ queryKey: rackKeys.lists() });
    },
  });
}
