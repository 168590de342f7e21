import type { List } from '../../shared/schemas/common';
import { createJobSchema, type CreateJobInput, type Job, type JobListQuery, type UpdateJobInput } from '../../shared/schemas/job';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { changedFields, recordAudit, type Actor } from './audit';

/** States in which a part has had every coat of its system. */
export const throughStates = ['drying', 'ready-to-handle', 'ready-to-pack', 'cured', 'collected'];

interface JobRow {
  id: number;
  partCount: number;
  partsThrough: number;
  coatedAreaM2: number;
  finishSystemName: string | null;
}

/** Part counts, progress and area for a page of jobs, grouped in the database. */
async function jobFigures(data: SiteData, ids: number[]): Promise<Map<number, JobRow>> {
  if (ids.length === 0) return new Map();
  const rows = await data.jobs
    .select('j')
    .leftJoin('parts', 'p', 'p.job_id = j.id')
    .leftJoin('finish_systems', 'fs', 'fs.id = j.finish_system_id')
    .select('j.id', 'id')
    .addSelect('fs.name', 'finishSystemName')
    .addSelect('COUNT(p.id)', 'partCount')
    .addSelect('COALESCE(SUM(p.coated_area_m2), 0)', 'coatedAreaM2')
    .addSelect(`SUM(CASE WHEN p.state IN (${throughStates.map((s) => `'${s}'`).join(', ')}) THEN 1 ELSE 0 END)`, 'partsThrough')
    .where('j.id IN (:...ids)', { ids })
    .groupBy('j.id')
    .addGroupBy('fs.name')
    .getRawMany<Record<string, string | number | null>>();
  return new Map(
    rows.map((r) => [
      Number(r.id),
      { id: Number(r.id), partCount: Number(r.partCount), partsThrough: Number(r.partsThrough ?? 0), coatedAreaM2: Number(r.coatedAreaM2), finishSystemName: (r.finishSystemName as string | null) ?? null },
    ]),
  );
}

function toJobDto(job: JobEntity, figures: JobRow | undefined): Job {
  return {
    id: job.id,
    customer: job.customer,
    reference: job.reference,
    dueDate: job.dueDate,
    finishSystemId: job.finishSystemId,
    finishSystemName: figures?.finishSystemName ?? null,
    colour: job.colour,
    sheen: job.sheen,
    notes: job.notes,
    state: job.state,
    partCount: figures?.partCount ?? 0,
    partsThrough: figures?.partsThrough ?? 0,
    coatedAreaM2: Math.round((figures?.coatedAreaM2 ?? 0) * 1000) / 1000,
    createdAt: job.createdAt,
    updatedAt: job.updatedAt,
  };
}

async function assertFinishSystem(tx: SiteData, id: number | null | undefined): Promise<void> {
  if (id && !(await tx.finishSystems.existsBy({ id }))) {
    throw new AppError('validation_failed', 'That finish system does not exist', { finishSystemId: 'Choose a finish system' });
  }
}

async function assertReferenceFree(tx: SiteData, reference: string | undefined, exceptId?: number): Promise<void> {
  if (!reference) return;
  const existing = await tx.jobs.findOneBy({ reference });
  if (existing && existing.id !== exceptId) throw new AppError('conflict', `Job reference ${reference} is already used`, { reference: 'Already used by another job' });
}

/** Jobs are the group's work orders: every site sees the same job book. */
export function createJobService(data: SiteData, clock: Clock = systemClock) {
  async function getWith(tx: SiteData, id: number): Promise<Job> {
    const job = await tx.jobs.findOneBy({ id });
    if (!job) throw notFound('Job');
    return toJobDto(job, (await jobFigures(tx, [id])).get(id));
  }

  return {
    async list(query: JobListQuery): Promise<List<Job>> {
      const qb = data.jobs.select('j');
      if (query.q) qb.andWhere('(LOWER(j.customer) LIKE :q OR LOWER(j.reference) LIKE :q)', { q: `%${query.q.toLowerCase()}%` });
      if (query.state) qb.andWhere('j.state = :state', { state: query.state });
      qb.orderBy('j.due_date', 'ASC').addOrderBy('j.id', 'ASC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      const figures = await jobFigures(data, rows.map((r) => r.id));
      return { items: rows.map((r) => toJobDto(r, figures.get(r.id))), total, page: query.page, pageSize: query.pageSize };
    },

    get: (id: number) => getWith(data, id),

    async create(input: CreateJobInput, actor: Actor): Promise<Job> {
      const fields = createJobSchema.parse(input);
      const now = clock.now();
      return data.transaction(async (tx) => {
        await assertFinishSystem(tx, fields.finishSystemId);
        await assertReferenceFree(tx, fields.reference);
        const job = await tx.jobs.save(tx.jobs.create({ ...fields, createdAt: now.toISOString(), updatedAt: now.toISOString() }));
        await recordAudit(tx, actor, { action: 'create', entity: 'job', entityId: job.id, summary: `Added job ${job.reference} for ${job.customer}` }, now);
        return getWith(tx, job.id);
      });
    },

    async update(id: number, patch: UpdateJobInput, actor: Actor): Promise<Job> {
      const now = clock.now();
      return data.transaction(async (tx) => {
        const job = await tx.jobs.findOneBy({ id });
        if (!job) throw notFound('Job');
        await assertFinishSystem(tx, patch.finishSystemId);
        await assertReferenceFree(tx, patch.reference, id);
        const changes = changedFields(job, patch);
        Object.assign(job, patch, { updatedAt: now.toISOString() });
        await tx.jobs.save(job);
        await recordAudit(tx, actor, { action: 'update', entity: 'job', entityId: id, summary: `Changed job ${job.reference}`, changes }, now);
        return getWith(tx, id);
      });
    },
  };
}

export type JobService = ReturnType<typeof createJobService>;
