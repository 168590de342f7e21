import type { PageQuery } from '../../../shared/schemas/common';

export const siteKeys = {
  all: ['sites'] as const,
  lists: () => [...siteKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...siteKeys.lists(), filters] as const,
  counts: () => [...siteKeys.all, 'counts'] as const,
};
