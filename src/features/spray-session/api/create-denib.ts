import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { denibSchema, type CreateDenibInput } from '../../../../shared/schemas/denib';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const denibResponseSchema = z.object({ denib: denibSchema });

export async function createDenib(input: CreateDenibInput) {
  const { denib } = await apiClient.post('/api/denibs', input, denibResponseSchema);
  return denib;
}

/** A denib changes what the parts need next, so the session's coats, denibs and readiness all refresh. */
export function useCreateDenib(sessionId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDenib,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: spraySessionKeys.denibs(sessionId) }),
        queryClient.invalidateQueries({ queryKey: spraySessionKeys.readyAll() }),
      ]),
  });
}
