import type { EstimateQuery, JobListQuery } from '../../../shared/schemas/job';

export type JobFilters = Partial<JobListQuery>;
export type EstimateFilters = Partial<EstimateQuery>;

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (filters: JobFilters) => [...jobKeys.lists(), filters] as const,
  details: () => [...jobKeys.all, 'detail'] as const,
  detail: (id: number) => [...jobKeys.details(), id] as const,
  estimates: () => [...jobKeys.all, 'estimate'] as const,
  estimate: (id: number, filters: EstimateFilters) => [...jobKeys.estimates(), id, filters] as const,
};
