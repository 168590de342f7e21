import { useMutation, useQueryClient } from '@tanstack/react-query';
import { filterChangeResponseSchema, type CreateFilterChangeInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A filter changed, with the gauge before and after. */
export async function recordFilterChange(input: CreateFilterChangeInput) {
  const { filterChange } = await apiClient.post('/api/filter-changes', input, filterChangeResponseSchema);
  return filterChange;
}

export function useRecordFilterChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordFilterChange,
    onSuccess: () => invalidate(queryClient, changedKeys.upkeep()),
  });
}
