import { useMutation, useQueryClient } from '@tanstack/react-query';
import { gaugeReadingResponseSchema, type CreateGaugeReadingInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A pressure-drop reading across a filter bank, typed from its gauge. */
export async function recordGaugeReading(input: CreateGaugeReadingInput) {
  const { reading } = await apiClient.post('/api/readings/filter-gauge', input, gaugeReadingResponseSchema);
  return reading;
}

export function useRecordGaugeReading() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordGaugeReading,
    onSuccess: () => invalidate(queryClient, changedKeys.upkeep()),
  });
}
