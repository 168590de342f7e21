import { useMutation, useQueryClient } from '@tanstack/react-query';
import { readingResponseSchema, type CreateReadingInput } from '../../../shared/schemas/reading';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createReading(input: CreateReadingInput) {
  const { reading } = await apiClient.post('/api/readings', input, readingResponseSchema);
  return reading;
}

export function useCreateReading() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createReading, onSuccess: () => invalidate(queryClient, changedKeys.reading()) });
}
