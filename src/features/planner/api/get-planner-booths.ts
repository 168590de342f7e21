import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const boothListSchema = listSchema(boothSchema);

/** Every booth in one page: a shop has a handful, and the planner shows them all. */
export function getPlannerBooths(signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

export const plannerBoothsQueryOptions = () => queryOptions({ queryKey: plannerKeys.booths(), queryFn: ({ signal }) => getPlannerBooths(signal) });

export function usePlannerBooths() {
  return useQuery(plannerBoothsQueryOptions());
}
