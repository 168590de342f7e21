import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { coatSchema, type CreateCoatInput } from '../../../../shared/schemas/coat';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const coatResponseSchema = z.object({ coat: coatSchema, replayed: z.boolean().optional() });

/** A coat always carries an idempotency key, so sending it twice (a dropped answer, a resend) makes one record. */
export async function createCoat(input: CreateCoatInput & { idempotencyKey: string }) {
  return apiClient.post('/api/coats', input, coatResponseSchema);
}

export function useCreateCoat(sessionId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCoat,
    // Sent even when the browser says it is offline: the network error is what moves the coat into the pending queue.
    networkMode: 'always',
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: spraySessionKeys.coats(sessionId) }),
        queryClient.invalidateQueries({ queryKey: spraySessionKeys.readyAll() }),
      ]),
  });
}
