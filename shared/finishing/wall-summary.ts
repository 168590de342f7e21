import type { ReadyPart, ReadySummary, ReadySummaryJob } from '../schemas/ready';
import { groupBy } from '../group-by';
import { readinessMovedOn, type ReadinessState } from './readiness';

export type StateCounts = Partial<Record<ReadinessState, number>>;

/** The order the board lists parts in: what can be picked up now first, then what will be soonest. */
export const boardOrder: readonly ReadinessState[] = ['ready-to-handle', 'ready-to-pack', 'cured', 'drying', 'in-finish', 'waiting', 'collected'];

/** The times of a part's answer that move its state on by themselves. */
export type PartTimes = Pick<ReadyPart, 'state' | 'handleAt' | 'packAt' | 'fullCureAt'>;

const instant = (iso: string | null) => (iso === null ? null : new Date(iso));

/** The answer's state moved on to `now` by the shared rule (a state begins at its instant; never behind the answer). */
export function stateAt(part: PartTimes, now: Date): ReadinessState {
  return readinessMovedOn(part.state, { handleAt: instant(part.handleAt), packAt: instant(part.packAt), fullCureAt: instant(part.fullCureAt) }, now);
}

export function countStates(parts: readonly { shownState: ReadinessState }[]): StateCounts {
  const counts: StateCounts = {};
  for (const part of parts) counts[part.shownState] = (counts[part.shownState] ?? 0) + 1;
  return counts;
}

const byLabel = new Intl.Collator('en-GB', { numeric: true });

type Ordered = { shownState: ReadinessState; handleAt: string | null; label: string };

/** Board order; drying parts soonest ready first; then by label, numbers as numbers ("Door 2" before "Door 10"). */
export function compareForBoard(a: Ordered, b: Ordered): number {
  const rank = boardOrder.indexOf(a.shownState) - boardOrder.indexOf(b.shownState);
  if (rank !== 0) return rank;
  if (a.shownState === 'drying') {
    const gap = Date.parse(a.handleAt ?? '') - Date.parse(b.handleAt ?? '');
    if (gap) return gap;
  }
  return byLabel.compare(a.label, b.label);
}

export interface WallLimits {
  jobs: number;
  next: number;
  waiting: number;
  /** How long a collected part stays on the board (it leaves, and its job's count changes, at collection + this). */
  collectedForMs: number;
}

type Shown = ReadyPart & { shownState: ReadinessState };

/** The first instant after `now` at which the part's count changes with no write: a drying time passing, or leaving the board once collected. */
function nextChangeOf(part: Shown, now: Date, collectedForMs: number): number {
  let times: number[] = [];
  if (part.shownState === 'collected' && part.collectedAt) times = [Date.parse(part.collectedAt) + collectedForMs];
  // Between coats, waiting or collected, a part keeps the server's state whatever its times say.
  else if (dryingStates.has(part.shownState)) times = [part.handleAt, part.packAt, part.fullCureAt].map((at) => Date.parse(at ?? ''));
  return soonest(times.filter((at) => at > now.getTime()));
}

const dryingStates: ReadonlySet<ReadinessState> = new Set(['drying', 'ready-to-handle', 'ready-to-pack']);
const soonest = (times: number[]) => times.reduce((a, b) => Math.min(a, b), Infinity);

const isoOrNull = (ms: number) => (Number.isFinite(ms) ? new Date(ms).toISOString() : null);

/** Higher is more for the assembler to do now; orders the cards. */
function urgencyOf(counts: StateCounts): number {
  const n = (state: ReadinessState) => counts[state] ?? 0;
  return (n('ready-to-handle') + n('ready-to-pack') + n('cured')) * 1000 + n('drying') * 10 + n('in-finish');
}

function jobOf(parts: Shown[], now: Date, limits: WallLimits): ReadySummaryJob & { urgency: number } {
  const counts = countStates(parts);
  const nextChange = soonest(parts.map((p) => nextChangeOf(p, now, limits.collectedForMs)));
  const { jobId, jobReference, customer } = parts[0];
  return { jobId, jobReference, customer, counts, partsLeft: parts.length - (counts.collected ?? 0), nextChangeAt: isoOrNull(nextChange), urgency: urgencyOf(counts) };
}

const byReference = (a: { jobReference: string }, b: { jobReference: string }) => byLabel.compare(a.jobReference, b.jobReference);

/**
 * What the wall shows, from the board's parts at `now`: jobs with parts still to collect, busiest
 * first; those still waiting for a first coat in one line; and the parts that will be ready soonest.
 * It carries the instants at which its counts change next, so a cache or a screen knows when it is stale.
 */
export function summariseForWall(items: readonly ReadyPart[], now: Date, limits: WallLimits): ReadySummary {
  const parts: Shown[] = items.map((part) => ({ ...part, shownState: stateAt(part, now) }));
  const everyJob = [...groupBy(parts, (p) => p.jobId).values()].map((jobParts) => jobOf(jobParts, now, limits));
  const jobs = everyJob.filter((job) => job.partsLeft > 0);
  const waiting = jobs.filter((job) => (job.counts.waiting ?? 0) === job.partsLeft).sort(byReference);
  const active = jobs.filter((job) => (job.counts.waiting ?? 0) !== job.partsLeft).sort((a, b) => b.urgency - a.urgency || byReference(a, b));
  const nextReady = parts.filter((part) => part.shownState === 'drying').sort(compareForBoard).slice(0, limits.next);
  return {
    jobs: active.slice(0, limits.jobs).map(({ urgency: _urgency, ...job }) => job),
    jobsInFinish: active.length,
    waitingJobs: waiting.slice(0, limits.waiting).map((job) => ({ jobReference: job.jobReference, parts: job.partsLeft })),
    waitingJobsCount: waiting.length,
    nextReady: nextReady.map(({ id, label, jobReference, handleAt, rack }) => ({ id, label, jobReference, handleAt, rack })),
    totals: countStates(parts),
    nextChangeAt: isoOrNull(soonest(everyJob.map((job) => Date.parse(job.nextChangeAt ?? '')).filter(Number.isFinite))),
    asOf: now.toISOString(),
  };
}
