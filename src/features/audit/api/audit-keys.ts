import type { PageQuery } from '../../../../shared/schemas/common';

export const auditKeys = {
  all: ['audit'] as const,
  list: (filters: PageQuery) => [...auditKeys.all, 'list', filters] as const,
};
