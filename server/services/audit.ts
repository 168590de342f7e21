import type { EntityManager } from 'typeorm';
import type { AuditEntry } from '../../shared/schemas/audit';
import type { List, PageQuery } from '../../shared/schemas/common';
import { AuditEntryEntity } from '../db/entities/audit-entry.entity';
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
}

/** Call inside the transaction that makes the change, so the trail and the data never disagree. */
export async function recordAudit(manager: EntityManager, actor: Actor, input: AuditInput, at: Date): Promise<void> {
  await manager.save(AuditEntryEntity, {
    at: at.toISOString(),
    userId: actor.id,
    userName: actor.name,
    action: input.action,
    entity: input.entity,
    entityId: input.entityId === null ? null : String(input.entityId),
    summary: input.summary,
    changes: input.changes ?? null,
  });
}


export function listAudit(manager: EntityManager, query: PageQuery): Promise<List<AuditEntry>> {
  return paginate(manager.getRepository(AuditEntryEntity), query, { order: { id: 'DESC' } }, (row) => ({
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
