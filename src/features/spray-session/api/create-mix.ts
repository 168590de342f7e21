import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { mixSchema, type CreateMixInput } from '../../../../shared/schemas/checklist';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const mixResponseSchema = z.object({ mix: mixSchema });

export async function createMix({ sessionId, input }: { sessionId: number; input: CreateMixInput }) {
  const { mix } = await apiClient.post(`/api/spray-sessions/${sessionId}/mixes`, input, mixResponseSchema);
  return mix;
}

export function useCreateMix(sessionId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMix,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: spraySessionKeys.mixes(sessionId) }),
  });
}
