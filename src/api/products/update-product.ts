import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productResponseSchema, type UpdateProductInput } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { productKeys } from './product-keys';

export async function updateProduct({ id, changes }: { id: number; changes: UpdateProductInput }) {
  const { product } = await apiClient.patch(`/api/products/${id}`, changes, productResponseSchema);
  return product;
}

/** Every screen showing the product (a spray session's coat form, the planner's cautions) refreshes with it. */
export function useUpdateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProduct,
    onSuccess: (product) => {
      queryClient.setQueryData(productKeys.detail(product.id), product);
      return invalidate(queryClient, changedKeys.product());
    },
  });
}
