import { useMutation, useQueryClient } from '@tanstack/react-query';
import { lotResponseSchema, type CreateLotInput } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function addLot({ productId, input }: { productId: number; input: CreateLotInput }) {
  const { lot } = await apiClient.post(`/api/products/${productId}/lots`, input, lotResponseSchema);
  return lot;
}

export function useAddLot() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addLot,
    // The server works out "expired" against the shop's date, so the product is fetched again rather than patched here.
    onSuccess: () => invalidate(queryClient, changedKeys.product()),
  });
}
