import type { SprayMethod } from '../../../../shared/finishing/material';
import type { JobListQuery } from '../../../../shared/schemas/job';

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (filters: JobListQuery) => [...jobKeys.lists(), filters] as const,
  details: () => [...jobKeys.all, 'detail'] as const,
  detail: (id: number) => [...jobKeys.details(), id] as const,
  // Under `all` so that anything changing a job's parts (and so its area) refreshes its estimate too.
  estimates: (id: number) => [...jobKeys.all, 'estimate', id] as const,
  estimate: (id: number, method: SprayMethod, transferEfficiencyPct?: number) => [...jobKeys.estimates(id), { method, transferEfficiencyPct }] as const,
  // Under `all`, so a coat, denib or collection on the job's parts refreshes when it will be ready.
  readyTime: (id: number) => [...jobKeys.all, 'ready-time', id] as const,
  // Under the finish systems' own root key, so their screens' invalidations refresh this list as well.
  finishSystemChoices: () => ['finish-systems', 'job-form-choices'] as const,
};
