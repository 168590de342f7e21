import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { finishSystemSchema } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const finishSystemListSchema = listSchema(finishSystemSchema);

export function getPlannerFinishSystems(signal?: AbortSignal) {
  return apiClient.get('/api/finish-systems', finishSystemListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

export const plannerFinishSystemsQueryOptions = (enabled = true) =>
  queryOptions({ queryKey: plannerKeys.finishSystems(), queryFn: ({ signal }) => getPlannerFinishSystems(signal), staleTime: 60_000, enabled });

export function usePlannerFinishSystems(enabled = true) {
  return useQuery(plannerFinishSystemsQueryOptions(enabled));
}
