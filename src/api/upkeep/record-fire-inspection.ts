import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fireInspectionResponseSchema, type CreateFireInspectionInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A fire inspection of the booth, passed or not, and when the next is due. */
export async function recordFireInspection(input: CreateFireInspectionInput) {
  const { fireInspection } = await apiClient.post('/api/fire-inspections', input, fireInspectionResponseSchema);
  return fireInspection;
}

export function useRecordFireInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordFireInspection,
    onSuccess: () => invalidate(queryClient, changedKeys.upkeep()),
  });
}
