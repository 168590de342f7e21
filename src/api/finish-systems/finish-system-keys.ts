import type { PageQuery } from '../../../shared/schemas/common';

export const finishSystemKeys = {
  all: ['finish-systems'] as const,
  lists: () => [...finishSystemKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...finishSystemKeys.lists(), filters] as const,
  details: () => [...finishSystemKeys.all, 'detail'] as const,
  detail: (id: number) => [...finishSystemKeys.details(), id] as const,
};
