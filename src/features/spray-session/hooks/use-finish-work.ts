import { useMemo } from 'react';
import type { Job } from '../../../../shared/schemas/job';
import { useFinishSystems } from '../api/get-finish-systems';
import { useProducts } from '../api/get-products';
import { useReadyByJobs } from '../api/get-ready-parts';
import { useSessionJobs } from '../api/get-session-jobs';
import type { FinishWork } from '../utils/session-plan';

const unique = (ids: number[]) => [...new Set(ids)].sort((a, b) => a - b);

/** For the jobs given: each job's finish system, the data sheets of its coat steps and where each part stands. */
export function useFinishWork(jobIds: number[]): FinishWork & { jobs: Map<number, Job>; pending: boolean; readyPending: boolean; error: unknown } {
  const wantedJobs = unique(jobIds);
  const { jobs, pending: jobsPending } = useSessionJobs(wantedJobs);
  const systemIds = unique(jobs.flatMap((job) => (job.finishSystemId === null ? [] : [job.finishSystemId])));
  const { systems, pending: systemsPending } = useFinishSystems(systemIds);
  const productIds = unique(systems.flatMap((system) => system.steps.flatMap((step) => (step.kind === 'coat' ? [step.productId] : []))));
  const { products, pending: productsPending, error } = useProducts(productIds);
  const { ready, pending: readyPending } = useReadyByJobs(wantedJobs);

  const jobKey = jobs.map((j) => `${j.id}:${j.finishSystemId}`).join();
  const systemKey = systems.map((s) => `${s.id}:${s.updatedAt}`).join();
  const productKey = products.map((p) => `${p.id}:${p.updatedAt}`).join();
  // Rebuilt only when what was fetched changes, so children can depend on the maps.
  const maps = useMemo(
    () => ({
      jobs: new Map(jobs.map((job) => [job.id, job])),
      systemByJob: new Map(jobs.flatMap((job) => systems.filter((s) => s.id === job.finishSystemId).map((s) => [job.id, s] as const))),
      products: new Map(products.map((product) => [product.id, product])),
    }),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [jobKey, systemKey, productKey],
  );
  return { ...maps, ready, readyPending, pending: jobsPending || systemsPending || productsPending, error };
}
