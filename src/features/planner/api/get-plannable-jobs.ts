import { useQuery } from '@tanstack/react-query';
import { jobsQueryOptions } from '../../../api/jobs/get-jobs';

/** Jobs still to be finished: ready, delivered and cancelled ones have nothing left to spray. */
export function usePlannableJobs(enabled = true) {
  return useQuery({
    ...jobsQueryOptions({ page: 1, pageSize: 200 }),
    select: (list) => list.items.filter((job) => job.state === 'open' || job.state === 'in-finish'),
    enabled,
  });
}
