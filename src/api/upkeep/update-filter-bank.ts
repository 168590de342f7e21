import { useMutation, useQueryClient } from '@tanstack/react-query';
import { filterBankResponseSchema, type UpdateFilterBankInput } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** A bank's name, limits or whether it is in use. */
export async function updateFilterBank({ id, changes }: { id: number; changes: UpdateFilterBankInput }) {
  const { filterBank } = await apiClient.patch(`/api/filter-banks/${id}`, changes, filterBankResponseSchema);
  return filterBank;
}

export function useUpdateFilterBank() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateFilterBank, onSuccess: () => invalidate(queryClient, changedKeys.upkeep()) });
}
