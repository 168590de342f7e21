import { queryOptions, useQuery } from '@tanstack/react-query';
import { partListSchema } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { partKeys } from './part-keys';

/** A job's parts in one page of up to 1000: the table, the totals and the tag sheet all want every part. */
export function getJobParts(jobId: number, signal?: AbortSignal) {
  return apiClient.get(`/api/jobs/${jobId}/parts`, partListSchema, { query: { page: 1, pageSize: 1000 }, signal });
}

export const jobPartsQueryOptions = (jobId: number) =>
  queryOptions({ queryKey: partKeys.list({ jobId }), queryFn: ({ signal }) => getJobParts(jobId, signal) });

export function useJobParts(jobId: number | null) {
  return useQuery({ ...jobPartsQueryOptions(jobId ?? 0), enabled: jobId !== null });
}
