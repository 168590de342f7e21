import { useMutation, useQueryClient } from '@tanstack/react-query';
import { spraySessionResponseSchema, type CreateSpraySessionInput } from '../../../shared/schemas/spray-session';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createSpraySession(input: CreateSpraySessionInput) {
  const { spraySession } = await apiClient.post('/api/spray-sessions', input, spraySessionResponseSchema);
  return spraySession;
}

export function useCreateSpraySession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSpraySession,
    onSuccess: () => invalidate(queryClient, changedKeys.spraySession()),
  });
}
