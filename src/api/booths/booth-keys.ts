import type { PageQuery } from '../../../shared/schemas/common';

/** A page of booths; an admin may name one site (left out: every site they see). */
export type BoothFilters = PageQuery & { siteId?: number };

export const boothKeys = {
  all: ['booths'] as const,
  lists: () => [...boothKeys.all, 'list'] as const,
  list: (filters: BoothFilters) => [...boothKeys.lists(), filters] as const,
  details: () => [...boothKeys.all, 'detail'] as const,
  detail: (id: number) => [...boothKeys.details(), id] as const,
};
