import type { PageQuery } from '../../../shared/schemas/common';

/** A page of users; an admin may name one site. */
export type UserFilters = PageQuery & { siteId?: number };

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (filters: UserFilters) => [...userKeys.lists(), filters] as const,
};
