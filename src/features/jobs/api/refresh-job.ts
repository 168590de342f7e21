import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { jobKeys } from './job-keys';

/**
 * A job's part count, progress, area, estimate and ready time are worked out from its parts. Parts are
 * another feature, so the route hands this to it to call after any change to a job's parts.
 */
export function useRefreshJob(jobId: number) {
  const queryClient = useQueryClient();
  return useCallback(
    () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: jobKeys.estimates(jobId) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.readyTime(jobId) }),
      ]).then(() => undefined),
    [queryClient, jobId],
  );
}
