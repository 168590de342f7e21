import type { CoatQuery } from '../../../shared/schemas/coat';

/** What a coat list is asked for; what is left out takes the server's default. */
export type CoatFilters = Partial<CoatQuery>;

export const coatKeys = {
  all: ['coats'] as const,
  lists: () => [...coatKeys.all, 'list'] as const,
  list: (filters: CoatFilters) => [...coatKeys.lists(), filters] as const,
};
