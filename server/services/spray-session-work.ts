import { In } from 'typeorm';
import { projectedRecoatWindow, sharedRecoatWindow } from '../../shared/finishing/recoat-window';
import type { FinishStep, RecoatWindow } from '../../shared/finishing/readiness';
import { emptySessionWork, type SessionCoat, type SessionItemDto, type SessionWork } from '../../shared/schemas/spray-session';
import { idListParam, type SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import type { ProductEntity } from '../db/entities/product.entity';
import type { SpraySessionItemEntity } from '../db/entities/spray-session-item.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { bookedStepsOf, type BookedPartStep } from './booked-steps';
import { currentCoatStepsByPart, nextCoatStep, stepsByJob, type CoatStep } from './part-coats';
import type { SprayedPart } from './sprayed-unplanned';

export interface WorkContext {
  planningTempC: number;
  now: Date;
}

/** Everything about the sessions' parts, read once for a whole list of sessions. */
interface Known {
  parts: Map<number, PartJob>;
  jobs: Map<number, JobEntity>;
  steps: Map<number, FinishStep[]>;
  products: Map<number, ProductEntity>;
  coats: Map<number, CoatStep[]>;
  /** Live bookings by part and step. */
  booked: Map<string, BookedPartStep[]>;
  planningTempC: number;
}

const bookingKey = (partId: number, step: number) => `${partId}:${step}`;

function byPartAndStep(booked: BookedPartStep[]): Map<string, BookedPartStep[]> {
  const map = new Map<string, BookedPartStep[]>();
  for (const b of booked) {
    const key = bookingKey(b.partId, b.stepPosition);
    map.set(key, map.get(key) ?? []);
    map.get(key)!.push(b);
  }
  return map;
}

type PartJob = Pick<PartEntity, 'id' | 'jobId'>;

/** Which job each part belongs to: parts are the group's, every site reads them. */
async function jobsOfParts(data: SiteData, partIds: number[]): Promise<PartJob[]> {
  const { sql } = data;
  const rows = await sql.select<PartJob>(`SELECT id, job_id AS "jobId" FROM parts WHERE id IN (${sql.idList})`, [idListParam(sql.dialect, partIds)]);
  return rows.map((r) => ({ id: Number(r.id), jobId: Number(r.jobId) }));
}

/** A part's coats and bookings are facts of the part, whichever site they were at: they decide what is sprayed and the window. */
async function readKnown(data: SiteData, partIds: number[], context: WorkContext): Promise<Known> {
  const whole = data.acrossSites;
  const parts = await jobsOfParts(data, partIds);
  const [jobs, steps, coats] = await Promise.all([data.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) }), stepsByJob(data, parts), currentCoatStepsByPart(whole, partIds)]);
  const productIds = [...new Set([...steps.values()].flat().flatMap((s) => (s.kind === 'coat' ? [s.productId] : [])))];
  const [products, booked] = await Promise.all([
    productIds.length ? data.products.find({ where: { id: In(productIds) }, select: { id: true, name: true, dryingTimes: true } }) : [],
    bookedStepsOf(whole, parts, { coats, steps, now: context.now }),
  ]);
  return { parts: new Map(parts.map((p) => [p.id, p])), jobs: new Map(jobs.map((j) => [j.id, j])), steps, products: new Map(products.map((p) => [p.id, p])), coats, booked: byPartAndStep(booked), planningTempC: context.planningTempC };
}

type ResolvedItem = SessionItemDto & { step: number | null; jobId: number | null };

/** The step each item is for (a blank step: the one sprayed here, else the part's next), and whether it is on record. */
function resolveItem(known: Known, sessionId: number, item: Pick<SpraySessionItemEntity, 'partId' | 'stepPosition'>): ResolvedItem {
  const part = known.parts.get(item.partId);
  const coats = known.coats.get(item.partId) ?? [];
  const here = coats.filter((c) => c.spraySessionId === sessionId).sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  const step = item.stepPosition ?? here?.stepPosition ?? (part ? nextCoatStep(known.steps.get(part.jobId) ?? [], coats) : null);
  const ofStep = item.stepPosition === null ? here : coats.filter((c) => c.stepPosition === item.stepPosition).sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  return { partId: item.partId, stepPosition: item.stepPosition, sprayedAt: ofStep?.sprayedAt ?? null, step, jobId: part?.jobId ?? null };
}

function coatsOf(known: Known, items: ResolvedItem[]): SessionCoat[] {
  const groups = new Map<string, SessionCoat>();
  for (const item of items) {
    const job = item.jobId === null ? undefined : known.jobs.get(item.jobId);
    const system = job ? (known.steps.get(job.id) ?? []) : [];
    const step = item.step === null ? undefined : system[item.step];
    if (!job || step?.kind !== 'coat') continue;
    const coatSteps = system.flatMap((s, i) => (s.kind === 'coat' ? [i] : []));
    const key = `${job.id}:${item.step}`;
    const group = groups.get(key) ?? {
      jobId: job.id,
      jobReference: job.reference,
      colour: job.colour,
      stepPosition: item.step!,
      coatNumber: coatSteps.indexOf(item.step!) + 1,
      coatsTotal: coatSteps.length,
      productId: step.productId,
      productName: known.products.get(step.productId)?.name ?? 'Unknown product',
      partCount: 0,
      sprayedCount: 0,
    };
    group.partCount += 1;
    if (item.sprayedAt) group.sprayedCount += 1;
    groups.set(key, group);
  }
  return [...groups.values()];
}

/**
 * Of several live bookings of the previous coat, the one this session follows: the last to end
 * before it starts, else (booked the wrong way round) the first.
 */
function bookingBefore(bookings: BookedPartStep[], session: SpraySessionEntity): BookedPartStep | undefined {
  const others = bookings.filter((b) => b.sessionId !== session.id).sort((a, b) => a.end.getTime() - b.end.getTime());
  const start = new Date(session.startAt);
  return others.filter((b) => b.end <= start).at(-1) ?? others[0];
}

/** The window a part's previous coat leaves for `step`: on record, else projected from its live booking. */
function previousWindow(known: Known, session: SpraySessionEntity, item: ResolvedItem): (RecoatWindow & { projected: boolean }) | null {
  const system = item.jobId === null ? [] : (known.steps.get(item.jobId) ?? []);
  if (item.step === null) return null;
  const before = system.slice(0, item.step).flatMap((s, i) => (s.kind === 'coat' ? [i] : [])).at(-1);
  if (before === undefined) return null;
  // A denib planned between the two coats gives a mechanical key: then only the opening counts.
  const keyed = system.slice(before + 1, item.step).some((s) => s.kind === 'abrade');
  const coat = (known.coats.get(item.partId) ?? []).filter((c) => c.stepPosition === before).sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  if (coat) return { opensAt: new Date(coat.recoatOpensAt), closesAt: coat.recoatClosesAt && !keyed ? new Date(coat.recoatClosesAt) : null, projected: false };
  const booking = bookingBefore(known.booked.get(bookingKey(item.partId, before)) ?? [], session);
  const step = system[before];
  const product = step.kind === 'coat' ? known.products.get(step.productId) : undefined;
  if (!booking || !product) return null;
  const window = projectedRecoatWindow(booking.end, product.dryingTimes, known.planningTempC);
  return { opensAt: window.opensAt, closesAt: keyed ? null : window.closesAt, projected: true };
}

function workOf(known: Known, session: SpraySessionEntity, items: ResolvedItem[]): SessionWork {
  const coats = coatsOf(known, items);
  const jobIds = [...new Set(items.flatMap((i) => (i.jobId === null ? [] : [i.jobId])))];
  const windows = items.filter((i) => !i.sprayedAt).flatMap((i) => previousWindow(known, session, i) ?? []);
  const shared = sharedRecoatWindow(windows);
  return {
    partCount: new Set(items.map((i) => i.partId)).size,
    sprayedCount: new Set(items.filter((i) => i.sprayedAt).map((i) => i.partId)).size,
    jobs: jobIds.flatMap((id) => {
      const job = known.jobs.get(id);
      return job ? [{ id: job.id, reference: job.reference, colour: job.colour }] : [];
    }),
    coats,
    recoatWindow: shared ? { opensAt: shared.opensAt.toISOString(), closesAt: shared.closesAt?.toISOString() ?? null, projected: windows.some((w) => w.projected) } : null,
  };
}

function groupBySession<T extends { spraySessionId: number }>(rows: T[]): Map<number, T[]> {
  const bySession = new Map<number, T[]>();
  for (const row of rows) {
    if (!bySession.has(row.spraySessionId)) bySession.set(row.spraySessionId, []);
    bySession.get(row.spraySessionId)!.push(row);
  }
  return bySession;
}

/**
 * Each session's items with what is sprayed, and what the session sprays in words. Parts sprayed
 * there without being planned count in its work (a sprayer may add a part in the booth), though
 * they are not added to its plan.
 */
export async function sessionsWork(data: SiteData, sessions: SpraySessionEntity[], items: SpraySessionItemEntity[], context: WorkContext, unplanned: SprayedPart[] = []): Promise<Map<number, { items: SessionItemDto[]; work: SessionWork }>> {
  const partIds = [...new Set([...items, ...unplanned].map((i) => i.partId))];
  const known = partIds.length ? await readKnown(data, partIds, context) : null;
  const planned = groupBySession(items);
  const extra = groupBySession(unplanned);
  return new Map(
    sessions.map((session) => {
      const resolve = (item: Pick<SpraySessionItemEntity, 'partId' | 'stepPosition'>) => resolveItem(known!, session.id, item);
      const resolved = known ? (planned.get(session.id) ?? []).map(resolve) : [];
      const sprayedHere = known ? (extra.get(session.id) ?? []).map(resolve) : [];
      const dtoItems = resolved.map(({ partId, stepPosition, sprayedAt }) => ({ partId, stepPosition, sprayedAt }));
      return [session.id, { items: dtoItems, work: known ? workOf(known, session, [...resolved, ...sprayedHere]) : emptySessionWork }];
    }),
  );
}
