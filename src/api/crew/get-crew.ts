import { queryOptions, useQuery } from '@tanstack/react-query';
import { crewStatusListSchema } from '../../../shared/schemas/crew';
import { apiClient } from '../../lib/api-client';
import { crewKeys } from './crew-keys';

/** Everyone's status, never their details: what a lead may see. */
export async function getCrew(siteId: number | undefined, signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/crew', crewStatusListSchema, { query: { siteId }, signal });
  return items;
}

export const crewQueryOptions = (siteId: number | undefined) =>
  queryOptions({ queryKey: crewKeys.list(siteId), queryFn: ({ signal }) => getCrew(siteId, signal) });

export function useCrew(siteId: number | undefined) {
  return useQuery(crewQueryOptions(siteId));
}
