import { useMutation, useQueryClient } from '@tanstack/react-query';
import { jobResponseSchema, type CreateJobInput } from '../../../shared/schemas/job';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { jobKeys } from './job-keys';

export async function createJob(input: CreateJobInput) {
  const { job } = await apiClient.post('/api/jobs', input, jobResponseSchema);
  return job;
}

export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      return invalidate(queryClient, changedKeys.job());
    },
  });
}
