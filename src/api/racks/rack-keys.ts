import type { PageQuery } from '../../../shared/schemas/common';

/** A page of racks; an admin may name one site (left out: every site they see). */
export type RackFilters = PageQuery & { siteId?: number };

export const rackKeys = {
  all: ['racks'] as const,
  lists: () => [...rackKeys.all, 'list'] as const,
  list: (filters: RackFilters) => [...rackKeys.lists(), filters] as const,
};
