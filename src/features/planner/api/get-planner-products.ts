import { queryOptions, useQuery } from '@tanstack/react-query';
import { productListSchema } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

export function getPlannerProducts(signal?: AbortSignal) {
  return apiClient.get('/api/products', productListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** Chemistry and hazards for the cautions; only roles that read data sheets may ask. */
export const plannerProductsQueryOptions = (enabled: boolean) =>
  queryOptions({ queryKey: plannerKeys.products(), queryFn: ({ signal }) => getPlannerProducts(signal), staleTime: 60_000, enabled });

export function usePlannerProducts(enabled: boolean) {
  return useQuery(plannerProductsQueryOptions(enabled));
}
