import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productResponseSchema, type CreateProductInput } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { invalidate } from '../invalidate';
import { productKeys } from './product-keys';

export async function createProduct(input: CreateProductInput) {
  const { product } = await apiClient.post('/api/products', input, productResponseSchema);
  return product;
}

export function useCreateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProduct,
    onSuccess: (product) => {
      queryClient.setQueryData(productKeys.detail(product.id), product);
      return invalidate(queryClient, [productKeys.lists()]);
    },
  });
}
