import type { ReadyQuery, ReadySummaryQuery } from '../../../shared/schemas/ready';

/** Job and rack filter on the server; a state filter may stay on the client, where states tick over between fetches. */
export type ReadyFilters = Partial<Omit<ReadyQuery, 'state'>>;
export type ReadySummaryFilters = Partial<ReadySummaryQuery>;

export const readyKeys = {
  all: ['ready'] as const,
  lists: () => [...readyKeys.all, 'list'] as const,
  list: (filters: ReadyFilters) => [...readyKeys.lists(), filters] as const,
  summaries: () => [...readyKeys.all, 'summary'] as const,
  summary: (filters: ReadySummaryFilters) => [...readyKeys.summaries(), filters] as const,
};
