import { useMutation, useQueryClient } from '@tanstack/react-query';
import { jobResponseSchema, type UpdateJobInput } from '../../../shared/schemas/job';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { jobKeys } from './job-keys';

export async function updateJob({ id, changes }: { id: number; changes: UpdateJobInput }) {
  const { job } = await apiClient.patch(`/api/jobs/${id}`, changes, jobResponseSchema);
  return job;
}

/** A new finish system changes the estimate, the parts' next steps and the sessions' work. */
export function useUpdateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateJob,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      return invalidate(queryClient, changedKeys.job());
    },
  });
}
