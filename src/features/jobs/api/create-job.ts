import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateJobInput } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { jobResponseSchema } from './get-job';
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
      return queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
