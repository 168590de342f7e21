import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { CreateSpraySessionInput } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { plannerSessionSchema } from './get-spray-sessions';
import { plannerKeys } from './planner-keys';

export const sessionResponseSchema = z.object({ spraySession: plannerSessionSchema });

export async function createSpraySession(input: CreateSpraySessionInput) {
  const { spraySession } = await apiClient.post('/api/spray-sessions', input, sessionResponseSchema);
  return spraySession;
}

export function useCreateSpraySession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSpraySession,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: plannerKeys.sessions() }),
  });
}
