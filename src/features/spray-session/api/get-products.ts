import { queryOptions, useQueries } from '@tanstack/react-query';
import { z } from 'zod';
import { productSchema, type Product } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const productResponseSchema = z.object({ product: productSchema });

export async function getProduct(id: number, signal?: AbortSignal) {
  const { product } = await apiClient.get(`/api/products/${id}`, productResponseSchema, { signal });
  return product;
}

/** The data sheet: drying times, mix ratio, limits, hazards and lots (with their expiry worked out). */
export const productQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.product(id), queryFn: ({ signal }) => getProduct(id, signal), staleTime: 5 * 60_000 });

export function useProducts(ids: number[]): { products: Product[]; pending: boolean; error: unknown } {
  return useQueries({
    queries: ids.map((id) => productQueryOptions(id)),
    combine: (results) => ({
      products: results.flatMap((r) => (r.data ? [r.data] : [])),
      pending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}
