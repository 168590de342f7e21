import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { readyKeys } from './ready-keys';

// The board refetches its own list; it only needs to know the call went through.
const partResponseSchema = z.object({ part: z.object({ id: z.number(), label: z.string() }) });

export async function collectPart(partId: number) {
  const { part } = await apiClient.post(`/api/parts/${partId}/collect`, {}, partResponseSchema);
  return part;
}

export function useCollectPart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: collectPart,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: readyKeys.lists() }),
  });
}
