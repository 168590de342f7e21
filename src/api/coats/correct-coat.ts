import { useMutation, useQueryClient } from '@tanstack/react-query';
import { coatResponseSchema, type CorrectCoatInput } from '../../../shared/schemas/coat';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A correction is a new version of the coat; the old one stays, marked as replaced. */
export async function correctCoat({ id, correction }: { id: number; correction: CorrectCoatInput }) {
  const { coat } = await apiClient.post(`/api/coats/${id}/corrections`, correction, coatResponseSchema);
  return coat;
}

export function useCorrectCoat() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: correctCoat, onSuccess: () => invalidate(queryClient, changedKeys.coat()) });
}
