import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { productResponseSchema, type Product } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { productKeys } from './product-keys';

export async function getProduct(id: number, signal?: AbortSignal) {
  const { product } = await apiClient.get(`/api/products/${id}`, productResponseSchema, { signal });
  return product;
}

/** The data sheet: drying times, mix ratio, limits, hazards and lots (with their expiry worked out). */
export const productQueryOptions = (id: number) =>
  queryOptions({ queryKey: productKeys.detail(id), queryFn: ({ signal }) => getProduct(id, signal) });

export function useProduct(id: number) {
  return useQuery(productQueryOptions(id));
}

/** The data sheets of the products given, each from its own cached detail, so a change to one refreshes it everywhere. */
export function useProductsById(
  ids: number[],
  enabled = true,
): { products: Product[]; pending: boolean; error: unknown } {
  return useQueries({
    queries: ids.map((id) => ({ ...productQueryOptions(id), enabled })),
    combine: (results) => ({
      products: results.flatMap((r) => (r.data ? [r.data] : [])),
      pending: enabled && results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}
