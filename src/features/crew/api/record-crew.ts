import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { crewRecordSchema, type CreateCrewRecordInput } from '../../../../shared/schemas/crew';
import { apiClient } from '../../../lib/api-client';
import { crewKeys } from './crew-keys';

const responseSchema = z.object({ record: crewRecordSchema });

export async function recordCrew({ userId, record }: { userId: number; record: CreateCrewRecordInput }) {
  return (await apiClient.post(`/api/crew/${userId}/records`, record, responseSchema)).record;
}

export function useRecordCrew() {
  const queryClient = useQueryClient();
  // A new record changes the person's detail and everyone's status list, and what is due on the upkeep page.
  return useMutation({ mutationFn: recordCrew, onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: crewKeys.all }), queryClient.invalidateQueries({ queryKey: ['upkeep'] })]) });
}
