import type { PageQuery } from '../../../../shared/schemas/common';

export const boothKeys = {
  all: ['booths'] as const,
  lists: () => [...boothKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...boothKeys.lists(), filters] as const,
  details: () => [...boothKeys.all, 'detail'] as const,
  detail: (id: number) => [...boothKeys.details(), id] as const,
};
