import { inTransaction } from '../db/transaction';
import { randomBytes } from 'node:crypto';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { coatedAreaM2, pieceAreaM2 } from '../../shared/finishing/area';
import type { List, PageQuery } from '../../shared/schemas/common';
import { createPartSchema, type CreatePartInput, type Part, type UpdatePartInput } from '../../shared/schemas/part';
import { AuditEntryEntity } from '../db/entities/audit-entry.entity';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { changedFields, recordAudit, type Actor } from './audit';
import type { EventBus } from './events';
import { refreshJobStates } from './job-states';
import { refreshPartStates } from './part-states';

// Unambiguous characters only: a tag may be typed in by hand when a camera cannot read it.
const tagAlphabet = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export function newTag(): string {
  return [...randomBytes(8)].map((b) => tagAlphabet[b % tagAlphabet.length]).join('');
}

// 1 mm² is 1e-6 m²: round away float noise, not precision.
const round = (value: number) => Math.round(value * 1e6) / 1e6;

export function toPartDto(part: PartEntity, rackNames: Map<number, string>): Part {
  return {
    id: part.id,
    jobId: part.jobId,
    label: part.label,
    kind: part.kind,
    lengthMm: part.lengthMm,
    widthMm: part.widthMm,
    thicknessMm: part.thicknessMm,
    quantity: part.quantity,
    faces: part.faces,
    edges: part.edges,
    rackId: part.rackId,
    rackName: part.rackId === null ? null : (rackNames.get(part.rackId) ?? null),
    shelf: part.shelf,
    pieceAreaM2: round(pieceAreaM2(part)),
    coatedAreaM2: round(part.coatedAreaM2),
    tag: part.tag,
    state: part.state,
    createdAt: part.createdAt,
    updatedAt: part.updatedAt,
  };
}

async function rackNamesFor(manager: EntityManager, parts: PartEntity[]): Promise<Map<number, string>> {
  const ids = [...new Set(parts.map((p) => p.rackId).filter((id): id is number => id !== null))];
  const racks = ids.length ? await manager.findBy(RackEntity, { id: In(ids) }) : [];
  return new Map(racks.map((r) => [r.id, r.name]));
}

/** The rack must exist and the shelf must be one it has. */
async function assertRackPlace(manager: EntityManager, rackId: number | null | undefined, shelf: number | null | undefined): Promise<void> {
  if (!rackId) return;
  const rack = await manager.findOneBy(RackEntity, { id: rackId });
  if (!rack) throw new AppError('validation_failed', 'That rack does not exist', { rackId: 'Choose a rack' });
  if (shelf && shelf > rack.shelves) throw new AppError('validation_failed', `${rack.name} has ${rack.shelves} shelves`, { shelf: `Choose a shelf from 1 to ${rack.shelves}` });
}

function newPartEntity(manager: EntityManager, jobId: number, fields: ReturnType<typeof createPartSchema.parse>, now: string): PartEntity {
  return manager.create(PartEntity, { ...fields, jobId, coatedAreaM2: coatedAreaM2(fields), tag: newTag(), state: 'waiting', createdAt: now, updatedAt: now });
}

/** Where the part stood before its last collection (recorded on it, or for older ones in the trail); nowhere if it has a place again or the rack is gone. */
async function placeBeforeCollection(manager: EntityManager, part: PartEntity): Promise<{ rackId: number | null; shelf: number | null }> {
  if (part.rackId !== null || part.collectedAt === null) return { rackId: part.rackId, shelf: part.shelf };
  let place = { rackId: part.collectedFromRackId, shelf: part.collectedFromShelf };
  if (place.rackId === null) {
    const entry = await manager.findOne(AuditEntryEntity, { where: { entity: 'part', entityId: String(part.id), action: 'collect' }, order: { id: 'DESC' } });
    const changes = (entry?.changes ?? {}) as { rackId?: { from?: number | null }; shelf?: { from?: number | null } };
    place = { rackId: changes.rackId?.from ?? null, shelf: changes.shelf?.from ?? null };
  }
  if (place.rackId === null || !(await manager.existsBy(RackEntity, { id: place.rackId }))) return { rackId: null, shelf: null };
  return place;
}

export function createPartService(dataSource: DataSource, clock: Clock = systemClock, events?: EventBus) {
  // After the transaction commits, so a board that refetches sees the change.
  const published = (part: Part): Part => {
    events?.publish({ type: 'part.changed', id: part.id });
    return part;
  };

  async function dto(manager: EntityManager, part: PartEntity): Promise<Part> {
    return toPartDto(part, await rackNamesFor(manager, [part]));
  }

  return {
    async listForJob(jobId: number, query: PageQuery): Promise<List<Part>> {
      if (!(await dataSource.getRepository(JobEntity).existsBy({ id: jobId }))) throw notFound('Job');
      const [rows, total] = await dataSource.getRepository(PartEntity).findAndCount({ where: { jobId }, order: { id: 'ASC' }, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
      const names = await rackNamesFor(dataSource.manager, rows);
      return { items: rows.map((p) => toPartDto(p, names)), total, page: query.page, pageSize: query.pageSize };
    },

    async get(id: number): Promise<Part> {
      const part = await dataSource.getRepository(PartEntity).findOneBy({ id });
      if (!part) throw notFound('Part');
      return dto(dataSource.manager, part);
    },

    async getByTag(tag: string): Promise<Part> {
      const part = await dataSource.getRepository(PartEntity).findOneBy({ tag: tag.trim().toUpperCase() });
      if (!part) throw new AppError('not_found', `No part has the tag ${tag}`);
      return dto(dataSource.manager, part);
    },

    async create(jobId: number, input: CreatePartInput, actor: Actor): Promise<Part> {
      const fields = createPartSchema.parse(input);
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const job = await manager.findOneBy(JobEntity, { id: jobId });
        if (!job) throw notFound('Job');
        await assertRackPlace(manager, fields.rackId, fields.shelf);
        const part = await manager.save(newPartEntity(manager, jobId, fields, now.toISOString()));
        await recordAudit(manager, actor, { action: 'create', entity: 'part', entityId: part.id, summary: `Added part ${part.label} × ${part.quantity} to job ${job.reference}` }, now);
        await refreshJobStates(manager, [jobId], actor, now);
        return dto(manager, part);
      });
    },

    /** Many parts in one transaction and one audit entry: a cut list, not a part at a time. */
    async createMany(jobId: number, inputs: CreatePartInput[], actor: Actor, how = 'Added'): Promise<Part[]> {
      const rows = inputs.map((input) => createPartSchema.parse(input));
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const job = await manager.findOneBy(JobEntity, { id: jobId });
        if (!job) throw notFound('Job');
        for (const row of rows) await assertRackPlace(manager, row.rackId, row.shelf);
        const stored = await manager.save(rows.map((row) => newPartEntity(manager, jobId, row, now.toISOString())), { chunk: 200 });
        await recordAudit(manager, actor, { action: 'create', entity: 'part', entityId: null, summary: `${how} ${stored.length} parts to job ${job.reference}` }, now);
        await refreshJobStates(manager, [jobId], actor, now);
        const names = await rackNamesFor(manager, stored);
        return stored.map((p) => toPartDto(p, names));
      });
    },

    /**
     * Taken off the rack by an assembler: frees the shelf, and says so in the trail. Undoing it
     * puts the part back on the rack and shelf the trail says it was taken from, if still empty of it.
     */
    async setCollected(id: number, collected: boolean, actor: Actor): Promise<Part> {
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const part = await manager.findOneBy(PartEntity, { id });
        if (!part) throw notFound('Part');
        const place = collected ? { rackId: part.rackId, shelf: part.shelf } : await placeBeforeCollection(manager, part);
        const rackName = place.rackId ? (await rackNamesFor(manager, [place as PartEntity])).get(place.rackId) : null;
        // Collected twice: it was taken from where the first collection says.
        const from = part.collectedAt ? { collectedFromRackId: part.collectedFromRackId, collectedFromShelf: part.collectedFromShelf } : { collectedFromRackId: part.rackId, collectedFromShelf: part.shelf };
        const taken = { collectedAt: now.toISOString(), ...from, rackId: null, shelf: null };
        const back = { collectedAt: null, collectedFromRackId: null, collectedFromShelf: null, ...place };
        Object.assign(part, collected ? taken : back, { updatedAt: now.toISOString() });
        await manager.save(part);
        await refreshPartStates(manager, [part.id], actor, now);
        part.state = (await manager.findOneByOrFail(PartEntity, { id })).state;
        const where = rackName ? `${collected ? ' from' : ' on'} ${rackName}${place.shelf ? ` shelf ${place.shelf}` : ''}` : '';
        const summary = collected ? `Collected part ${part.label}${where}` : `Put part ${part.label} back as not collected${where}`;
        const changes = collected ? { rackId: { from: place.rackId, to: null }, shelf: { from: place.shelf, to: null } } : undefined;
        await recordAudit(manager, actor, { action: collected ? 'collect' : 'uncollect', entity: 'part', entityId: id, summary, changes }, now);
        return dto(manager, part);
      }).then(published);
    },

    async update(id: number, patch: UpdatePartInput, actor: Actor): Promise<Part> {
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const part = await manager.findOneBy(PartEntity, { id });
        if (!part) throw notFound('Part');
        await assertRackPlace(manager, patch.rackId ?? part.rackId, patch.shelf ?? part.shelf);
        const changes = changedFields(part, patch);
        Object.assign(part, patch, { updatedAt: now.toISOString() });
        part.coatedAreaM2 = coatedAreaM2(part);
        await manager.save(part);
        await recordAudit(manager, actor, { action: 'update', entity: 'part', entityId: id, summary: `Changed part ${part.label}`, changes }, now);
        return dto(manager, part);
      }).then(published);
    },
  };
}

export type PartService = ReturnType<typeof createPartService>;
