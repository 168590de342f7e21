import { useMutation, useQueryClient } from '@tanstack/react-query';
import { boothResponseSchema, type UpdateBoothInput } from '../../../shared/schemas/booth';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { boothKeys } from './booth-keys';

export async function updateBooth({ id, changes }: { id: number; changes: UpdateBoothInput }) {
  const { booth } = await apiClient.patch(`/api/booths/${id}`, changes, boothResponseSchema);
  return booth;
}

export function useUpdateBooth() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBooth,
    onSuccess: (booth) => {
      queryClient.setQueryData(boothKeys.detail(booth.id), booth);
      return invalidate(queryClient, changedKeys.booth());
    },
  });
}
