import { useMutation, useQueryClient } from '@tanstack/react-query';
import { denibResponseSchema, type CreateDenibInput } from '../../../shared/schemas/denib';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createDenib(input: CreateDenibInput) {
  const { denib } = await apiClient.post('/api/denibs', input, denibResponseSchema);
  return denib;
}

/** A denib changes what the parts need next, so everything showing their readiness refreshes. */
export function useCreateDenib() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createDenib, onSuccess: () => invalidate(queryClient, changedKeys.denib()) });
}
