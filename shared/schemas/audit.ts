import { z } from 'zod';
import { listSchema } from './common';

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  userId: z.number().int().nullable(),
  userName: z.string(),
  action: z.string(),
  entity: z.string(),
  entityId: z.string().nullable(),
  summary: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditListSchema = listSchema(auditEntrySchema);
