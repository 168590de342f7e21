import type { DenibQuery } from '../../../shared/schemas/denib';

export type DenibFilters = Partial<DenibQuery>;

export const denibKeys = {
  all: ['denibs'] as const,
  lists: () => [...denibKeys.all, 'list'] as const,
  list: (filters: DenibFilters) => [...denibKeys.lists(), filters] as const,
};
