import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateBoothInput } from '../../../../shared/schemas/booth';
import { apiClient } from '../../../lib/api-client';
import { boothKeys } from './booth-keys';
import { boothResponseSchema } from './get-booth';

export async function createBooth(input: CreateBoothInput) {
  const { booth } = await apiClient.post('/api/booths', input, boothResponseSchema);
  return booth;
}

export function useCreateBooth() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBooth,
    onSuccess: (booth) => {
      queryClient.setQueryData(boothKeys.detail(booth.id), booth);
      return queryClient.invalidateQueries({ queryKey: boothKeys.lists() });
    },
  });
}
