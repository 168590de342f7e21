import { useMemo } from 'react';
import type { Job } from '../../../../shared/schemas/job';
import type { Rack } from '../../../../shared/schemas/rack';
import { useJobs } from '../../../api/jobs/get-jobs';
import { useRacks } from '../../../api/racks/get-racks';

export type JobChoice = Pick<Job, 'id' | 'reference' | 'customer'>;
export type RackChoice = Pick<Rack, 'id' | 'name'>;

// The latest 200 jobs and every rack: a shop's choices fit one page.
const onePage = { page: 1, pageSize: 200 };
const byReference = new Intl.Collator('en-GB', { numeric: true });

/** Filter choices; while they load or if they fail, the filters offer "All" only and the board still works. */
export function useReadyChoices(): { jobs: JobChoice[]; racks: RackChoice[] } {
  const jobs = useJobs(onePage);
  const racks = useRacks(onePage);
  const sortedJobs = useMemo(
    () => [...(jobs.data?.items ?? [])].sort((a, b) => byReference.compare(a.reference, b.reference)),
    [jobs.data],
  );
  return { jobs: sortedJobs, racks: racks.data?.items ?? [] };
}
