import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partResponseSchema } from '../../../shared/schemas/part';
import { apiClient, apiRequest } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function collectPart(partId: number) {
  const { part } = await apiClient.post(`/api/parts/${partId}/collect`, {}, partResponseSchema);
  return part;
}

/** Undo of a "Collected" tap: the part goes back to its rack place. */
export async function uncollectPart(partId: number) {
  const { part } = await apiRequest('DELETE', `/api/parts/${partId}/collect`, partResponseSchema);
  return part;
}

export function useCollectPart() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: collectPart, onSuccess: () => invalidate(queryClient, changedKeys.part()) });
}

export function useUncollectPart() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uncollectPart, onSuccess: () => invalidate(queryClient, changedKeys.part()) });
}
