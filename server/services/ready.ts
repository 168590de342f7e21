import { In, IsNull, MoreThan } from 'typeorm';
import { partReadiness, type FinishStep, type PartReadiness } from '../../shared/finishing/readiness';
import type { ReadyPart } from '../../shared/schemas/ready';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import { systemClock, type Clock } from '../lib/clock';
import { currentCoatsByPart, stepsByJob, toPartCoats } from './part-coats';
import { partsSeenBy } from './part-sites';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

function describeStep(step: FinishStep | null): string | null {
  if (!step) return null;
  return step.kind === 'abrade' ? `Abrade ${step.grit}` : `Coat at ${step.dryFilmUm} µm dry`;
}

/**
 * Readiness of each part at `now`, from its current coats and its job's finish system. It is a
 * fact about the part, so every coat counts, whichever site sprayed it; callers show it only for
 * parts their scope sees.
 */
export async function readinessOf(data: SiteData, parts: PartEntity[], now: Date): Promise<Map<number, PartReadiness>> {
  const whole = data.acrossSites;
  const [coats, steps] = await Promise.all([currentCoatsByPart(whole, parts.map((p) => p.id)), stepsByJob(whole, parts)]);
  return new Map(
    parts.map((part) => {
      const system = steps.get(part.jobId) ?? [];
      const collectedAt = part.collectedAt ? new Date(part.collectedAt) : null;
      return [part.id, partReadiness({ steps: system, coats: toPartCoats(coats.get(part.id) ?? [], system), collectedAt, now })];
    }),
  );
}

// Collected parts stay on the board for a week (to show them, and to undo a wrong "collected");
// older ones are history, seen on their job. A shop's whole past must not load on every refresh.
const collectedStaysOnBoardMs = 7 * 86_400_000;
const boardLimit = 5000;

async function boardParts(data: SiteData, query: { jobId?: number; rackId?: number }, now: Date): Promise<PartEntity[]> {
  const scope = { ...(query.jobId ? { jobId: query.jobId } : {}), ...(query.rackId ? { rackId: query.rackId } : {}) };
  const since = new Date(now.getTime() - collectedStaysOnBoardMs).toISOString();
  const where = query.jobId ? scope : [{ ...scope, collectedAt: IsNull() }, { ...scope, collectedAt: MoreThan(since) }];
  // Sorted here rather than in SQL: an ORDER BY job makes SQLite walk every part by job instead of using the collected-at index.
  const parts = await data.parts.find({ where });
  const seen = await partsSeenBy(data, parts);
  return parts.filter((p) => seen.has(p.id)).sort((a, b) => a.jobId - b.jobId || a.id - b.id).slice(0, boardLimit);
}

/** The ready board: the parts the scope sees (on its site's racks, or last coated there, or not yet begun). */
export function createReadyService(data: SiteData, clock: Clock = systemClock) {
  return {
    async list(query: { jobId?: number; rackId?: number; state?: string }): Promise<ReadyPart[]> {
      const now = clock.now();
      const parts = await boardParts(data, query, now);
      const [readiness, jobs, racks] = await Promise.all([
        readinessOf(data, parts, now),
        data.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) }),
        data.racks.findBy({ id: In([...new Set(parts.map((p) => p.rackId).filter((id): id is number => id !== null))]) }),
      ]);
      const jobById = new Map(jobs.map((j) => [j.id, j]));
      const rackById = new Map(racks.map((r) => [r.id, r]));
      const items = parts.map((part): ReadyPart => {
        const r = readiness.get(part.id)!;
        const rack = part.rackId ? rackById.get(part.rackId) : undefined;
        return {
          id: part.id,
          label: part.label,
          jobId: part.jobId,
          jobReference: jobById.get(part.jobId)?.reference ?? '',
          customer: jobById.get(part.jobId)?.customer ?? '',
          state: r.state,
          coatsDone: r.coatsDone,
          coatsTotal: r.coatsTotal,
          nextStep: describeStep(r.nextStep),
          nextWindowOpensAt: iso(r.nextWindow?.opensAt),
          nextWindowClosesAt: iso(r.nextWindow?.closesAt),
          abradeRequired: r.abradeRequired,
          handleAt: iso(r.handleAt),
          packAt: iso(r.packAt),
          fullCureAt: iso(r.fullCureAt),
          rack: rack ? { id: rack.id, name: rack.name, shelf: part.shelf } : null,
        };
      });
      return query.state ? items.filter((i) => i.state === query.state) : items;
    },
  };
}

export type ReadyService = ReturnType<typeof createReadyService>;
