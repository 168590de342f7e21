import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { partSchema } from '../../../../shared/schemas/part';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const partListSchema = listSchema(partSchema);

export function getJobParts(jobId: number, signal?: AbortSignal) {
  return apiClient.get(`/api/jobs/${jobId}/parts`, partListSchema, { query: { page: 1, pageSize: 1000 }, signal });
}

export const jobPartsQueryOptions = (jobId: number | null) =>
  queryOptions({
    queryKey: plannerKeys.jobParts(jobId ?? 0),
    queryFn: ({ signal }) => getJobParts(jobId ?? 0, signal),
    enabled: jobId !== null,
  });

export function useJobParts(jobId: number | null) {
  return useQuery(jobPartsQueryOptions(jobId));
}
