import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { productListSchema, type ProductListQuery } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { productKeys } from './product-keys';

export function getProducts(filters: ProductListQuery, signal?: AbortSignal) {
  return apiClient.get('/api/products', productListSchema, { query: filters, signal });
}

export const productsQueryOptions = (filters: ProductListQuery) =>
  queryOptions({
    queryKey: productKeys.list(filters),
    queryFn: ({ signal }) => getProducts(filters, signal),
    // Keeps the last page on screen while a new search or sort loads, so the table does not flash empty.
    placeholderData: keepPreviousData,
  });

export function useProducts(filters: ProductListQuery, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...productsQueryOptions(filters), enabled });
}
