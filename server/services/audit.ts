import type { AuditEntry } from '../../shared/schemas/audit';
import type { List, PageQuery } from '../../shared/schemas/common';
import type { SiteData } from '../data/site-data';
import { paginate } from '../lib/paginate';

export interface Actor {
  id: number | null;
  name: string;
}

export const systemActor: Actor = { id: null, name: 'Boothwright' };

export interface AuditInput {
  action: string;
  entity: string;
  entityId: string | number | null;
  summary: string;
  changes?: Record<string, unknown> | null;
  /** The site the change is about (a booth's, a rack's, a session's); left out for group-wide things. */
  siteId?: number | null;
}

/** Call inside the transaction that makes the change, so the trail and the data never disagree. */
export async function recordAudit(tx: SiteData, actor: Actor, input: AuditInput, at: Date): Promise<void> {
  await tx.audit.save(
    tx.audit.create({
      at: at.toISOString(),
      userId: actor.id,
      userName: actor.name,
      action: input.action,
      entity: input.entity,
      entityId: input.entityId === null ? null : String(input.entityId),
      summary: input.summary,
      changes: input.changes ?? null,
      siteId: input.siteId ?? null,
    }),
  );
}

/** The trail newest first: the group's entries and those of the sites the reader sees. */
export function listAudit(data: SiteData, query: PageQuery): Promise<List<AuditEntry>> {
  return paginate(data.audit, query, { order: { id: 'DESC' } }, (row) => ({
    id: row.id,
    at: row.at,
    userId: row.userId,
    userName: row.userName,
    action: row.action,
    entity: row.entity,
    entityId: row.entityId,
    summary: row.summary,
  }));
}

/** The fields an update actually changed, old → new, for the audit trail. */
export function changedFields<T extends object>(before: T, patch: Partial<T>): Record<string, { from: unknown; to: unknown }> {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const [key, value] of Object.entries(patch)) {
    const old = (before as Record<string, unknown>)[key];
    if (value !== undefined && JSON.stringify(old) !== JSON.stringify(value)) changes[key] = { from: old, to: value };
  }
  return changes;
}
