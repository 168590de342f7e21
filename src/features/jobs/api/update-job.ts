import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateJobInput } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { jobResponseSchema } from './get-job';
import { jobKeys } from './job-keys';

export async function updateJob({ id, changes }: { id: number; changes: UpdateJobInput }) {
  const { job } = await apiClient.patch(`/api/jobs/${id}`, changes, jobResponseSchema);
  return job;
}

export function useUpdateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateJob,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      // A new finish system changes the estimate; the lists show the job too.
      return Promise.all([queryClient.invalidateQueries({ queryKey: jobKeys.lists() }), queryClient.invalidateQueries({ queryKey: jobKeys.estimates(job.id) })]);
    },
  });
}
