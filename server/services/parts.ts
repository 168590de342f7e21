import { randomBytes } from 'node:crypto';
import { In } from 'typeorm';
import { coatedAreaM2, pieceAreaM2 } from '../../shared/finishing/area';
import type { List, PageQuery } from '../../shared/schemas/common';
import { createPartSchema, type CreatePartInput, type Part, type UpdatePartInput } from '../../shared/schemas/part';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import type { RackEntity } from '../db/entities/rack.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { changedFields, recordAudit, type Actor } from './audit';
import type { EventBus } from './events';
import { refreshJobStates } from './job-states';
import { partSeenBy } from './part-sites';
import { refreshPartStates } from './part-states';

// Unambiguous characters only: a tag may be typed in by hand when a camera cannot read it.
const tagAlphabet = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export function newTag(): string {
  return [...randomBytes(8)].map((b) => tagAlphabet[b % tagAlphabet.length]).join('');
}

// 1 mm² is 1e-6 m²: round away float noise, not precision.
const round = (value: number) => Math.round(value * 1e6) / 1e6;

/** A part's rack place is shown only when the rack is one the reader's site sees. */
export function toPartDto(part: PartEntity, racks: Map<number, Pick<RackEntity, 'name'>>): Part {
  const rack = part.rackId === null ? undefined : racks.get(part.rackId);
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
    rackId: rack ? part.rackId : null,
    rackName: rack?.name ?? null,
    shelf: rack ? part.shelf : null,
    pieceAreaM2: round(pieceAreaM2(part)),
    coatedAreaM2: round(part.coatedAreaM2),
    tag: part.tag,
    state: part.state,
    createdAt: part.createdAt,
    updatedAt: part.updatedAt,
  };
}

/** The racks the parts stand on, as far as the scope sees them. */
async function racksFor(data: SiteData, parts: Pick<PartEntity, 'rackId'>[]): Promise<Map<number, RackEntity>> {
  const ids = [...new Set(parts.map((p) => p.rackId).filter((id): id is number => id !== null))];
  const racks = ids.length ? await data.racks.findBy({ id: In(ids) }) : [];
  return new Map(racks.map((r) => [r.id, r]));
}

/** The rack must be one of the scope's and the shelf one it has. */
async function assertRackPlace(tx: SiteData, rackId: number | null | undefined, shelf: number | null | undefined): Promise<RackEntity | null> {
  if (!rackId) return null;
  const rack = await tx.racks.findOneBy({ id: rackId });
  if (!rack) throw new AppError('validation_failed', 'That rack does not exist', { rackId: 'Choose a rack' });
  if (shelf && shelf > rack.shelves) throw new AppError('validation_failed', `${rack.name} has ${rack.shelves} shelves`, { shelf: `Choose a shelf from 1 to ${rack.shelves}` });
  return rack;
}

/** A part placed at another site is that site's to move, change or collect. */
async function partToChange(tx: SiteData, id: number): Promise<PartEntity> {
  const part = await tx.parts.findOneBy({ id });
  if (!part) throw notFound('Part');
  if (!(await partSeenBy(tx, part))) throw new AppError('forbidden', 'This part is at another site; ask that site to move or change it');
  return part;
}

/** Off its rack, remembering where it was taken from; collected twice, where the first collection says. */
function collectedFields(part: PartEntity, now: Date): Partial<PartEntity> {
  const from = part.collectedAt ? { collectedFromRackId: part.collectedFromRackId, collectedFromShelf: part.collectedFromShelf } : { collectedFromRackId: part.rackId, collectedFromShelf: part.shelf };
  return { collectedAt: now.toISOString(), ...from, rackId: null, shelf: null };
}

function newPartEntity(tx: SiteData, jobId: number, fields: ReturnType<typeof createPartSchema.parse>, now: string): PartEntity {
  return tx.parts.create({ ...fields, jobId, coatedAreaM2: coatedAreaM2(fields), tag: newTag(), state: 'waiting', createdAt: now, updatedAt: now });
}

/** Where the part stood before its last collection (recorded on it, or for older ones in the trail); nowhere if it has a place again or the rack is gone. */
async function placeBeforeCollection(tx: SiteData, part: PartEntity): Promise<{ rackId: number | null; shelf: number | null }> {
  if (part.rackId !== null || part.collectedAt === null) return { rackId: part.rackId, shelf: part.shelf };
  let place = { rackId: part.collectedFromRackId, shelf: part.collectedFromShelf };
  if (place.rackId === null) {
    const entry = await tx.audit.findOne({ where: { entity: 'part', entityId: String(part.id), action: 'collect' }, order: { id: 'DESC' } });
    const changes = (entry?.changes ?? {}) as { rackId?: { from?: number | null }; shelf?: { from?: number | null } };
    place = { rackId: changes.rackId?.from ?? null, shelf: changes.shelf?.from ?? null };
  }
  if (place.rackId === null || !(await tx.racks.existsBy({ id: place.rackId }))) return { rackId: null, shelf: null };
  return place;
}

export function createPartService(data: SiteData, clock: Clock = systemClock, events?: EventBus) {
  // After the transaction commits, so a board that refetches sees the change.
  const published = (part: Part): Part => {
    events?.publish({ type: 'part.changed', id: part.id, siteId: null });
    return part;
  };

  async function dto(tx: SiteData, part: PartEntity): Promise<Part> {
    return toPartDto(part, await racksFor(tx, [part]));
  }

  async function jobOrFail(tx: SiteData, jobId: number) {
    const job = await tx.jobs.findOneBy({ id: jobId });
    if (!job) throw notFound('Job');
    return job;
  }

  return {
    async listForJob(jobId: number, query: PageQuery): Promise<List<Part>> {
      await jobOrFail(data, jobId);
      const [rows, total] = await data.parts.findAndCount({ where: { jobId }, order: { id: 'ASC' }, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
      const racks = await racksFor(data, rows);
      return { items: rows.map((p) => toPartDto(p, racks)), total, page: query.page, pageSize: query.pageSize };
    },

    /** Several parts in one read, by id; ids that name nothing are left out. */
    async listByIds(ids: number[]): Promise<List<Part>> {
      const rows = ids.length ? await data.parts.findBy({ id: In(ids) }) : [];
      rows.sort((a, b) => a.id - b.id);
      const racks = await racksFor(data, rows);
      return { items: rows.map((p) => toPartDto(p, racks)), total: rows.length, page: 1, pageSize: ids.length };
    },

    async get(id: number): Promise<Part> {
      const part = await data.parts.findOneBy({ id });
      if (!part) throw notFound('Part');
      return dto(data, part);
    },

    async getByTag(tag: string): Promise<Part> {
      const part = await data.parts.findOneBy({ tag: tag.trim().toUpperCase() });
      if (!part) throw new AppError('not_found', `No part has the tag ${tag}`);
      return dto(data, part);
    },

    async create(jobId: number, input: CreatePartInput, actor: Actor): Promise<Part> {
      const fields = createPartSchema.parse(input);
      const now = clock.now();
      return data.transaction(async (tx) => {
        const job = await jobOrFail(tx, jobId);
        const rack = await assertRackPlace(tx, fields.rackId, fields.shelf);
        const part = await tx.parts.save(newPartEntity(tx, jobId, fields, now.toISOString()));
        const summary = `Added part ${part.label} × ${part.quantity} to job ${job.reference}`;
        await recordAudit(tx, actor, { action: 'create', entity: 'part', entityId: part.id, summary, siteId: rack?.siteId }, now);
        await refreshJobStates(tx, [jobId], actor, now);
        return dto(tx, part);
      });
    },

    /** Many parts in one transaction and one audit entry: a cut list, not a part at a time. */
    async createMany(jobId: number, inputs: CreatePartInput[], actor: Actor, how = 'Added'): Promise<Part[]> {
      const rows = inputs.map((input) => createPartSchema.parse(input));
      const now = clock.now();
      return data.transaction(async (tx) => {
        const job = await jobOrFail(tx, jobId);
        for (const row of rows) await assertRackPlace(tx, row.rackId, row.shelf);
        const stored = await tx.parts.saveMany(rows.map((row) => newPartEntity(tx, jobId, row, now.toISOString())), { chunk: 200 });
        await recordAudit(tx, actor, { action: 'create', entity: 'part', entityId: null, summary: `${how} ${stored.length} parts to job ${job.reference}` }, now);
        await refreshJobStates(tx, [jobId], actor, now);
        const racks = await racksFor(tx, stored);
        return stored.map((p) => toPartDto(p, racks));
      });
    },

    /**
     * Taken off the rack by an assembler: frees the shelf, and says so in the trail. Undoing it
     * puts the part back on the rack and shelf the trail says it was taken from, if still empty of it.
     */
    async setCollected(id: number, collected: boolean, actor: Actor): Promise<Part> {
      const now = clock.now();
      return data
        .transaction(async (tx) => {
          const part = await partToChange(tx, id);
          const place = collected ? { rackId: part.rackId, shelf: part.shelf } : await placeBeforeCollection(tx, part);
          const rack = place.rackId === null ? undefined : (await racksFor(tx, [place])).get(place.rackId);
          Object.assign(part, collected ? collectedFields(part, now) : { collectedAt: null, collectedFromRackId: null, collectedFromShelf: null, ...place }, { updatedAt: now.toISOString() });
          await tx.parts.save(part);
          await refreshPartStates(tx, [part.id], actor, now);
          part.state = (await tx.parts.findOneBy({ id }))?.state ?? part.state;
          const where = rack ? `${collected ? ' from' : ' on'} ${rack.name}${place.shelf ? ` shelf ${place.shelf}` : ''}` : '';
          const summary = collected ? `Collected part ${part.label}${where}` : `Put part ${part.label} back as not collected${where}`;
          const changes = collected ? { rackId: { from: place.rackId, to: null }, shelf: { from: place.shelf, to: null } } : undefined;
          await recordAudit(tx, actor, { action: collected ? 'collect' : 'uncollect', entity: 'part', entityId: id, summary, changes, siteId: rack?.siteId }, now);
          return dto(tx, part);
        })
        .then(published);
    },

    async update(id: number, patch: UpdatePartInput, actor: Actor): Promise<Part> {
      const now = clock.now();
      return data
        .transaction(async (tx) => {
          const part = await partToChange(tx, id);
          const rack = await assertRackPlace(tx, patch.rackId ?? part.rackId, patch.shelf ?? part.shelf);
          const changes = changedFields(part, patch);
          Object.assign(part, patch, { updatedAt: now.toISOString() });
          part.coatedAreaM2 = coatedAreaM2(part);
          await tx.parts.save(part);
          await recordAudit(tx, actor, { action: 'update', entity: 'part', entityId: id, summary: `Changed part ${part.label}`, changes, siteId: rack?.siteId }, now);
          return dto(tx, part);
        })
        .then(published);
    },
  };
}

export type PartService = ReturnType<typeof createPartService>;
