import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { jobSchema } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { reportKeys } from './report-keys';

const jobChoicesSchema = listSchema(jobSchema.pick({ id: true, reference: true, customer: true }));

export function getJobChoices(signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobChoicesSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** The choices in the material report's job filter: the latest 200 jobs. */
export const jobChoicesQueryOptions = () => queryOptions({ queryKey: reportKeys.jobs(), queryFn: ({ signal }) => getJobChoices(signal), staleTime: 5 * 60_000 });

export function useJobChoices() {
  return useQuery(jobChoicesQueryOptions());
}
