import { useMutation, useQueryClient } from '@tanstack/react-query';
import { crewRecordResponseSchema, type CreateCrewRecordInput } from '../../../shared/schemas/crew';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A fit test, health check or training record of one person. */
export async function recordCrew({ userId, record }: { userId: number; record: CreateCrewRecordInput }) {
  const { record: saved } = await apiClient.post(`/api/crew/${userId}/records`, record, crewRecordResponseSchema);
  return saved;
}

export function useRecordCrew() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: recordCrew, onSuccess: () => invalidate(queryClient, changedKeys.crew()) });
}
