import type { PageQuery } from '../../../../shared/schemas/common';

export const rackKeys = {
  all: ['racks'] as const,
  lists: () => [...rackKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...rackKeys.lists(), filters] as const,
  details: () => [...rackKeys.all, 'detail'] as const,
  detail: (id: number) => [...rackKeys.details(), id] as const,
};
