import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { productListSchema } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { productKeys, type ProductFilters } from './product-keys';

export function getProducts(filters: ProductFilters, signal?: AbortSignal) {
  return apiClient.get('/api/products', productListSchema, { query: filters, signal });
}

export const productsQueryOptions = (filters: ProductFilters) =>
  queryOptions({
    queryKey: productKeys.list(filters),
    queryFn: ({ signal }) => getProducts(filters, signal),
    // Keeps the last page on screen while a new search or sort loads, so the table does not flash empty.
    placeholderData: keepPreviousData,
  });

export function useProducts(filters: ProductFilters, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...productsQueryOptions(filters), enabled });
}
