import { useMemo } from 'react';
import type { FinishSystem } from '../../../shared/schemas/finish-system';
import type { Job } from '../../../shared/schemas/job';
import type { Product } from '../../../shared/schemas/product';
import { useFinishSystemsById } from '../finish-systems/get-finish-system';
import { useJobsById } from '../jobs/get-job';
import { useProductsById } from '../products/get-product';

export interface FinishWork {
  jobs: Map<number, Job>;
  systemByJob: Map<number, FinishSystem>;
  products: Map<number, Product>;
  pending: boolean;
  error: unknown;
}

const unique = (ids: number[]) => [...new Set(ids)].sort((a, b) => a - b);

/**
 * The one way from parts to what they are sprayed with: for the jobs given, each job, its finish
 * system and the data sheets of the system's coat steps. Each comes from its resource's own cached
 * detail, so a change to a job, system or product refreshes every screen that shows it.
 * `products: false` for roles that do not read data sheets.
 */
export function useFinishWork(
  jobIds: number[],
  { products: readProducts = true }: { products?: boolean } = {},
): FinishWork {
  const { jobs, pending: jobsPending, error: jobsError } = useJobsById(unique(jobIds));
  const systemIds = unique(jobs.flatMap((job) => (job.finishSystemId === null ? [] : [job.finishSystemId])));
  const { systems, pending: systemsPending, error: systemsError } = useFinishSystemsById(systemIds);
  const productIds = unique(
    systems.flatMap((system) => system.steps.flatMap((step) => (step.kind === 'coat' ? [step.productId] : []))),
  );
  const { products, pending: productsPending, error: productsError } = useProductsById(productIds, readProducts);

  const jobKey = jobs.map((j) => `${j.id}:${j.finishSystemId}:${j.updatedAt}`).join();
  const systemKey = systems.map((s) => `${s.id}:${s.updatedAt}`).join();
  const productKey = products.map((p) => `${p.id}:${p.updatedAt}`).join();
  // Rebuilt only when what was fetched changes, so children can depend on the maps.
  const maps = useMemo(
    () => ({
      jobs: new Map(jobs.map((job) => [job.id, job])),
      systemByJob: new Map(
        jobs.flatMap((job) => systems.filter((s) => s.id === job.finishSystemId).map((s) => [job.id, s] as const)),
      ),
      products: new Map(products.map((product) => [product.id, product])),
    }),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [jobKey, systemKey, productKey],
  );
  return {
    ...maps,
    pending: jobsPending || systemsPending || productsPending,
    error: jobsError ?? systemsError ?? productsError,
  };
}
