import { useMutation, useQueryClient } from '@tanstack/react-query';
import { boothResponseSchema, type CreateBoothInput } from '../../../shared/schemas/booth';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { boothKeys } from './booth-keys';

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
      return invalidate(queryClient, changedKeys.booth());
    },
  });
}
