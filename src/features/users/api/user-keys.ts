import type { PageQuery } from '../../../../shared/schemas/common';

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...userKeys.lists(), filters] as const,
  detail: (id: number) => [...userKeys.all, 'detail', id] as const,
};
