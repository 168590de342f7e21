import { useMutation, useQueryClient } from '@tanstack/react-query';
import { mixResponseSchema, type CreateMixInput } from '../../../shared/schemas/checklist';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createMix({ spraySessionId, input }: { spraySessionId: number; input: CreateMixInput }) {
  const { mix } = await apiClient.post(`/api/spray-sessions/${spraySessionId}/mixes`, input, mixResponseSchema);
  return mix;
}

export function useCreateMix() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createMix, onSuccess: () => invalidate(queryClient, changedKeys.mix()) });
}
