import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { jobSchema } from '../../../../shared/schemas/job';
import { productSchema } from '../../../../shared/schemas/product';
import { apiClient } from '../../../lib/api-client';
import { coatLogKeys } from './coat-log-keys';

const jobListSchema = listSchema(jobSchema.pick({ id: true, reference: true, customer: true }));
const productListSchema = listSchema(productSchema.pick({ id: true, name: true }));

export function getFilterJobs(signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

export function getFilterProducts(signal?: AbortSignal) {
  return apiClient.get('/api/products', productListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** The choices in the job filter: the latest 200 jobs. */
export const filterJobsQueryOptions = () => queryOptions({ queryKey: coatLogKeys.jobs(), queryFn: ({ signal }) => getFilterJobs(signal), staleTime: 5 * 60_000 });
export const filterProductsQueryOptions = () => queryOptions({ queryKey: coatLogKeys.products(), queryFn: ({ signal }) => getFilterProducts(signal), staleTime: 5 * 60_000 });

export function useFilterJobs() {
  return useQuery(filterJobsQueryOptions());
}

export function useFilterProducts() {
  return useQuery(filterProductsQueryOptions());
}
