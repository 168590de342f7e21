import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { listSchema, type PageQuery } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { auditKeys } from './audit-keys';

/**
 * The wire shape of an audit entry. shared/schemas/ has no audit schema yet; this mirrors the
 * agreed shape and should be replaced by the shared one when it lands.
 */
export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  action: z.string(),
  entity: z.string(),
  entityId: z.union([z.number(), z.string()]).nullable(),
  summary: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

const auditListSchema = listSchema(auditEntrySchema);

export function getAudit(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/audit', auditListSchema, { query: filters, signal });
}

export const auditQueryOptions = (filters: PageQuery) =>
  queryOptions({ queryKey: auditKeys.list(filters), queryFn: ({ signal }) => getAudit(filters, signal), placeholderData: keepPreviousData });

export function useAudit(filters: PageQuery) {
  return useQuery(auditQueryOptions(filters));
}
