import type { PageQuery } from '../../../shared/schemas/common';

export const auditKeys = {
  all: ['audit'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (filters: PageQuery) => [...auditKeys.lists(), filters] as const,
};
