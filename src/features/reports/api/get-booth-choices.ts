import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { reportKeys } from './report-keys';

const boothChoicesSchema = listSchema(boothSchema.pick({ id: true, name: true }));

export function getBoothChoices(siteId: number | undefined, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothChoicesSchema, { query: { page: 1, pageSize: 200, siteId }, signal });
}

/** The booths to report on (of one site when an admin picked one); a shop has a handful, so one page holds them all. */
export const boothChoicesQueryOptions = (siteId?: number) =>
  queryOptions({ queryKey: reportKeys.booths(siteId), queryFn: ({ signal }) => getBoothChoices(siteId, signal), staleTime: 5 * 60_000 });

export function useBoothChoices(siteId?: number) {
  return useQuery(boothChoicesQueryOptions(siteId));
}
