import { useMutation, useQueryClient } from '@tanstack/react-query';
import { coatCreatedResponseSchema, type CreateCoatInput } from '../../../shared/schemas/coat';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A coat always carries an idempotency key, so sending it twice (a dropped answer, a resend) makes one record. */
export function createCoat(input: CreateCoatInput & { idempotencyKey: string }) {
  return apiClient.post('/api/coats', input, coatCreatedResponseSchema);
}

export function useCreateCoat() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCoat,
    // Sent even when the browser says it is offline: the network error is what moves the coat into the pending queue.
    networkMode: 'always',
    onSuccess: () => invalidate(queryClient, changedKeys.coat()),
  });
}
