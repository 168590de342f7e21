import { In, IsNull, MoreThan, Not } from 'typeorm';
import type { PartReadyTime } from '../../shared/finishing/job-ready-time';
import type { FinishStep } from '../../shared/finishing/readiness';
import { summariseForWall } from '../../shared/finishing/wall-summary';
import type { ReadyJob, ReadyPart, ReadyQuery, ReadySummary, ReadySummaryQuery } from '../../shared/schemas/ready';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import type { RackEntity } from '../db/entities/rack.entity';
import { systemClock, type Clock } from '../lib/clock';
import { partsSeenBy } from './part-sites';
import type { PartFacts } from './readiness-inputs';
import { mapInSlices } from '../lib/in-slices';
import { readyJobsOf, readyTimesOf } from './ready-times';
import type { SettingsService } from './settings';
import { stepLineWords } from '../../shared/words';

export { readinessOf } from './readiness-inputs';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
const dayMs = 86_400_000;

type NextStepFields = Pick<ReadyPart, 'nextStep' | 'nextStepKind' | 'nextStepGrit' | 'nextStepDryFilmUm'>;

/**
 * The next step as the board reads it: what it is (a coat or a denib), its grit or dry film, and a
 * line of words. The stored step kind 'abrade' is a denib in the shop's words.
 */
export function nextStepFields(steps: FinishStep[], step: FinishStep | null, index: number | null): NextStepFields {
  if (!step) return { nextStep: null, nextStepKind: null, nextStepGrit: null, nextStepDryFilmUm: null };
  if (step.kind === 'abrade') return { nextStep: stepLineWords({ kind: 'denib', grit: step.grit }), nextStepKind: 'denib', nextStepGrit: step.grit, nextStepDryFilmUm: null };
  const coatSteps = steps.filter((s) => s.kind === 'coat').length;
  const coatNumber = index === null ? 0 : steps.slice(0, index + 1).filter((s) => s.kind === 'coat').length;
  return { nextStep: stepLineWords({ kind: 'coat', dryFilmUm: step.dryFilmUm, coatNumber, coatsTotal: coatSteps }), nextStepKind: 'coat', nextStepGrit: null, nextStepDryFilmUm: step.dryFilmUm };
}

// Collected parts stay on the board for a week unless asked for longer (to show them, and to undo
// a wrong "collected"); older ones are history, seen on their job. A shop's whole past must not load on every refresh.
const boardLimit = 5000;
// The summary counts what the board shows by default; a wall line names this many waiting jobs at most.
const summaryCollectedDays = 7;
const summaryWaitingShown = 12;

/** The board's parts the scope sees: on its site's racks, last coated there, or not yet begun. */
async function boardParts(data: SiteData, query: ReadyQuery, now: Date): Promise<PartEntity[]> {
  const jobScope = query.jobId ? { jobId: query.jobId } : {};
  const since = new Date(now.getTime() - (query.collectedDays ?? 7) * dayMs).toISOString();
  const onRack = query.rackId ? { rackId: query.rackId } : {};
  // A collected part has left its rack; it still belongs to the rack it was taken from.
  const takenFrom = query.rackId ? { collectedFromRackId: query.rackId } : {};
  const collectedWhen = query.jobId ? Not(IsNull()) : MoreThan(since);
  const where = query.jobId && !query.rackId ? jobScope : [{ ...jobScope, ...onRack, collectedAt: IsNull() }, { ...jobScope, ...takenFrom, collectedAt: collectedWhen }];
  // Sorted here rather than in SQL: an ORDER BY job makes SQLite walk every part by job instead of using the collected-at index.
  const parts = await data.parts.find({ where });
  const seen = await partsSeenBy(data, parts);
  return parts.filter((p) => seen.has(p.id)).sort((a, b) => a.jobId - b.jobId || a.id - b.id).slice(0, boardLimit);
}

interface Lookups {
  jobs: Map<number, JobEntity>;
  /** Only the racks the scope sees: a place on another site's rack is left out. */
  racks: Map<number, RackEntity>;
}

function place(racks: Map<number, RackEntity>, rackId: number | null, shelf: number | null) {
  const rack = rackId ? racks.get(rackId) : undefined;
  return rack ? { id: rack.id, name: rack.name, shelf } : null;
}

/** The latest denib since the part's last coat (or any, before its first coat). */
function denibSinceLastCoat(fact: PartFacts): string | null {
  const lastCoat = Math.max(0, ...fact.input.coats.map((c) => c.sprayedAt.getTime()));
  const after = (fact.input.abradedAt ?? []).filter((at) => at.getTime() > lastCoat);
  return iso(after.at(-1));
}

function toReadyPart(part: PartEntity, fact: PartFacts, time: PartReadyTime, { jobs, racks }: Lookups): ReadyPart {
  const r = time.readiness;
  const job = jobs.get(part.jobId);
  return {
    id: part.id,
    label: part.label,
    jobId: part.jobId,
    jobReference: job?.reference ?? '',
    customer: job?.customer ?? '',
    state: r.state,
    coatsDone: r.coatsDone,
    coatsTotal: r.coatsTotal,
    ...nextStepFields(fact.steps, r.nextStep, r.nextStepIndex),
    nextWindowOpensAt: iso(r.nextWindow?.opensAt),
    nextWindowClosesAt: iso(r.nextWindow?.closesAt),
    abradeRequired: r.abradeRequired,
    handleAt: iso(r.handleAt),
    packAt: iso(r.packAt),
    fullCureAt: iso(r.fullCureAt),
    rack: place(racks, part.rackId, part.shelf),
    coatsRemaining: time.coatsRemaining,
    nextCoatAt: iso(time.nextCoatAt),
    expectedHandleAt: iso(time.handleAt),
    expectedPackAt: iso(time.packAt),
    denibbedAt: denibSinceLastCoat(fact),
    collectedAt: part.collectedAt,
    collectedFrom: part.collectedAt ? place(racks, part.collectedFromRackId, part.collectedFromShelf) : null,
  };
}

/**
 * Parts with their readiness and expected times, in the shape the board and the part page read.
 * The times come from each part's whole history; a rack place is given only on the scope's racks.
 */
export async function readyPartsOf(data: SiteData, parts: PartEntity[], tempC: number, now: Date): Promise<ReadyPart[]> {
  return (await readyPartsAndTimes(data, parts, tempC, now)).items;
}

async function readyPartsAndTimes(data: SiteData, parts: PartEntity[], tempC: number, now: Date): Promise<{ items: ReadyPart[]; times: Map<number, PartReadyTime> }> {
  const rackIds = [...new Set(parts.flatMap((p) => [p.rackId, p.collectedFromRackId]).filter((id): id is number => id !== null))];
  const { facts, times } = await readyTimesOf(data, parts, tempC, now);
  const jobs = await data.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) });
  const racks = rackIds.length ? await data.racks.findBy({ id: In(rackIds) }) : [];
  const lookups = { jobs: new Map(jobs.map((j) => [j.id, j])), racks: new Map(racks.map((r) => [r.id, r])) };
  const items = await mapInSlices(parts, (slice) => slice.map((part) => toReadyPart(part, facts.get(part.id)!, times.get(part.id)!, lookups)));
  return { items, times };
}

/** The ready board: the parts the scope sees, with each of their jobs' expected ready times. */
export function createReadyService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  return {
    async list(query: ReadyQuery): Promise<{ items: ReadyPart[]; jobs: ReadyJob[] }> {
      const now = clock.now();
      const { planningDryingTempC } = await settings.get();
      const parts = await boardParts(data, query, now);
      const { items, times } = await readyPartsAndTimes(data, parts, planningDryingTempC, now);
      // The board's parts are worked out once: their jobs' times reuse them and add only the jobs' other parts.
      const jobs = await readyJobsOf(data, [...new Set(parts.map((p) => p.jobId))], planningDryingTempC, now, times);
      return { items: query.state ? items.filter((i) => i.state === query.state) : items, jobs };
    },

    /** The board in brief (the wall screen): the same parts and readiness, counted at the clock's now, never sent part by part. */
    async summary(query: ReadySummaryQuery): Promise<ReadySummary> {
      const now = clock.now();
      const { planningDryingTempC } = await settings.get();
      const parts = await boardParts(data, { collectedDays: summaryCollectedDays }, now);
      const items = await readyPartsOf(data, parts, planningDryingTempC, now);
      return summariseForWall(items, now, { jobs: query.jobs, next: query.next, waiting: summaryWaitingShown, collectedForMs: summaryCollectedDays * dayMs });
    },
  };
}

export type ReadyService = ReturnType<typeof createReadyService>;
