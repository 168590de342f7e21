import { z } from 'zod';

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
