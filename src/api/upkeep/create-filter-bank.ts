import { useMutation, useQueryClient } from '@tanstack/react-query';
import { filterBankResponseSchema, type CreateFilterBankInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A filter bank of a booth, with the gauge limits its changes are judged by. */
export async function createFilterBank(input: CreateFilterBankInput) {
  const { filterBank } = await apiClient.post('/api/filter-banks', input, filterBankResponseSchema);
  return filterBank;
}

export function useCreateFilterBank() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createFilterBank, onSuccess: () => invalidate(queryClient, changedKeys.upkeep()) });
}
