import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { lotSchema, type CreateLotInput } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { productKeys } from './product-keys';

const lotResponseSchema = z.object({ lot: lotSchema });

export async function addLot({ productId, input }: { productId: number; input: CreateLotInput }) {
  const { lot } = await apiClient.post(`/api/products/${productId}/lots`, input, lotResponseSchema);
  return lot;
}

export function useAddLot() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addLot,
    // The server works out "expired" against the shop's date, so the product is fetched again rather than patched here.
    onSuccess: (lot) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: productKeys.detail(lot.productId) }),
        queryClient.invalidateQueries({ queryKey: productKeys.lists() }),
      ]),
  });
}
