import { useMutation, useQueryClient } from '@tanstack/react-query';
import { extractionTestResponseSchema, type CreateExtractionTestInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** An extraction (face velocity) test of the booth. */
export async function recordExtractionTest(input: CreateExtractionTestInput) {
  const { extractionTest } = await apiClient.post('/api/extraction-tests', input, extractionTestResponseSchema);
  return extractionTest;
}

export function useRecordExtractionTest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordExtractionTest,
    onSuccess: () => invalidate(queryClient, changedKeys.upkeep()),
  });
}
