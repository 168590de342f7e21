import {
  useFinishWork as useJobsFinishWork,
  type FinishWork as JobsFinishWork,
} from '../../../api/finish-work/use-finish-work';
import { useReadyByJobs } from '../../../api/ready/get-ready';
import type { FinishWork } from '../utils/session-plan';

/** For the jobs given: each job's finish system, the data sheets of its coat steps and where each part stands. */
export function useFinishWork(jobIds: number[]): FinishWork & JobsFinishWork & { readyPending: boolean } {
  const work = useJobsFinishWork(jobIds);
  const { ready, pending: readyPending } = useReadyByJobs([...new Set(jobIds)].sort((a, b) => a - b));
  return { ...work, ready, readyPending };
}
