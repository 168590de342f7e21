import { queryOptions, useQuery } from '@tanstack/react-query';
import { upkeepDueResponseSchema } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

export async function getUpkeepDue(siteId: number | undefined, signal?: AbortSignal) {
  const { due } = await apiClient.get('/api/upkeep/due', upkeepDueResponseSchema, { query: { siteId }, signal });
  return due;
}

/** What is due soon or lapsed, booth upkeep and crew records alike. */
export const upkeepDueQueryOptions = (siteId: number | undefined) =>
  queryOptions({ queryKey: upkeepKeys.due(siteId), queryFn: ({ signal }) => getUpkeepDue(siteId, signal) });

export function useUpkeepDue(siteId: number | undefined) {
  return useQuery(upkeepDueQueryOptions(siteId));
}
