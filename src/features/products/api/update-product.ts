import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateProductInput } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { productResponseSchema } from './get-product';
import { productKeys } from './product-keys';

export async function updateProduct({ id, changes }: { id: number; changes: UpdateProductInput }) {
  const { product } = await apiClient.patch(`/api/products/${id}`, changes, productResponseSchema);
  return product;
}

export function useUpdateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProduct,
    onSuccess: (product) => {
      queryClient.setQueryData(productKeys.detail(product.id), product);
      return queryClient.invalidateQueries({ queryKey: productKeys.lists() });
    },
  });
}
