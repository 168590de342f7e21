import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { readyKeys } from './ready-keys';

const partResponseSchema = z.object({ part: z.object({ id: z.number(), label: z.string() }) });

/** Undo of a "Collected" tap: the part goes back on the board. */
export async function uncollectPart(partId: number) {
  const { part } = await apiRequest('DELETE', `/api/parts/${partId}/collect`, partResponseSchema);
  return part;
}

export function useUncollectPart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uncollectPart,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: readyKeys.lists() }),
  });
}
