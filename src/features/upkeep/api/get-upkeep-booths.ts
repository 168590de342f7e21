import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

const boothListSchema = listSchema(boothSchema);

/** The booths to choose from: every booth of the site looked at (a shop has a handful). */
export function getUpkeepBooths(siteId: number | undefined, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: { pageSize: 200, siteId }, signal });
}

export const upkeepBoothsQueryOptions = (siteId: number | undefined) => queryOptions({ queryKey: upkeepKeys.booths(siteId), queryFn: ({ signal }) => getUpkeepBooths(siteId, signal) });

export function useUpkeepBooths(siteId: number | undefined) {
  return useQuery(upkeepBoothsQueryOptions(siteId));
}
