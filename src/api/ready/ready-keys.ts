import type { ReadyQuery } from '../../../shared/schemas/ready';

/** Job and rack filter on the server; a state filter may stay on the client, where states tick over between fetches. */
export type ReadyFilters = Partial<Omit<ReadyQuery, 'state'>>;

export const readyKeys = {
  all: ['ready'] as const,
  lists: () => [...readyKeys.all, 'list'] as const,
  list: (filters: ReadyFilters) => [...readyKeys.lists(), filters] as const,
};
