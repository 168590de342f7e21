import { queryOptions, useQuery } from '@tanstack/react-query';
import { siteListSchema } from '../../../shared/schemas/site';
import { apiClient } from '../../lib/api-client';
import { siteKeys } from './site-keys';

// A group has a handful of sites; one page holds them all.
const everySite = { page: 1, pageSize: 200 };

export function getSites(signal?: AbortSignal) {
  return apiClient.get('/api/sites', siteListSchema, { query: everySite, signal });
}

/** Sites change rarely: the forms, tables and switchers that name them share one cached list. */
export const sitesQueryOptions = () =>
  queryOptions({
    queryKey: siteKeys.list(everySite),
    queryFn: ({ signal }) => getSites(signal),
    staleTime: 5 * 60_000,
  });

export function useSites() {
  return useQuery(sitesQueryOptions());
}
