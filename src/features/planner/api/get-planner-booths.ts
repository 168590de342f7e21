import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const boothListSchema = listSchema(boothSchema);

/** Every booth in one page: a shop has a handful, and the planner shows them all. An admin may name one site. */
export function getPlannerBooths(siteId: number | undefined, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: { page: 1, pageSize: 200, siteId }, signal });
}

export const plannerBoothsQueryOptions = (siteId?: number) =>
  queryOptions({ queryKey: plannerKeys.booths(siteId), queryFn: ({ signal }) => getPlannerBooths(siteId, signal) });

export function usePlannerBooths(siteId?: number) {
  return useQuery(plannerBoothsQueryOptions(siteId));
}
