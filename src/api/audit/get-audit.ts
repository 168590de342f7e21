import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { auditListSchema } from '../../../shared/schemas/audit';
import type { PageQuery } from '../../../shared/schemas/common';
import { apiClient } from '../../lib/api-client';
import { auditKeys } from './audit-keys';

export function getAudit(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/audit', auditListSchema, { query: filters, signal });
}

/** Newest first. */
export const auditQueryOptions = (filters: PageQuery) =>
  queryOptions({
    queryKey: auditKeys.list(filters),
    queryFn: ({ signal }) => getAudit(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useAudit(filters: PageQuery) {
  return useQuery(auditQueryOptions(filters));
}
