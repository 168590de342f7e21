import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { productSchema } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { productKeys } from './product-keys';

export const productResponseSchema = z.object({ product: productSchema });

export async function getProduct(id: number, signal?: AbortSignal) {
  const { product } = await apiClient.get(`/api/products/${id}`, productResponseSchema, { signal });
  return product;
}

export const productQueryOptions = (id: number) =>
  queryOptions({ queryKey: productKeys.detail(id), queryFn: ({ signal }) => getProduct(id, signal) });

export function useProduct(id: number) {
  return useQuery(productQueryOptions(id));
}
