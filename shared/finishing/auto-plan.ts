import type { OpeningSpan } from '../schemas/booth';
import { calendarDateIn } from '../time';
import type { DryingRow } from './drying-row-schema';
import { adjustDryingTimes } from './drying-times';
import { openingHoursProblem } from './opening-hours';
import { sessionMinutes } from './planning';

export type PlanBooth = { id: number; name: string; openingHours: OpeningSpan[]; sprayRateM2PerH: number };
export type PlanStep = { position: number; kind: 'coat'; productName: string; dryingTimes: DryingRow[] } | { position: number; kind: 'abrade'; grit: string };
export type PlanJob = {
  id: number;
  reference: string;
  dueDate: string;
  partIds: number[];
  /** Coated area sprayed per coat, m². */
  areaM2: number;
  /** Shelf area the parts take lying flat, m². */
  footprintM2: number;
  remaining: PlanStep[];
  /** The recoat window left by the last coat already on the parts, if any. */
  lastWindow: Window | null;
};
type Window = { opensAt: Date; closesAt: Date | null };
type Interval = { boothId: number; start: Date; end: Date };
type RackLoad = { from: Date; until: Date; areaM2: number };

export type PlanInput = {
  now: Date;
  horizonDays: number;
  timeZone: string;
  planningTempC: number;
  setupMin: number;
  cleanDownMin: number;
  /** Time to denib between coats, off the booth: common practice, no published source. */
  abradeMin: number;
  booths: PlanBooth[];
  busy: Interval[];
  rackCapacityM2: number;
  rackLoad: RackLoad[];
  jobs: PlanJob[];
};

export type PlannedSession = { jobId: number; stepPosition: number; boothId: number; start: Date; end: Date; productName: string; areaM2: number; partIds: number[] };
export type JobPlan = { jobId: number; reference: string; dueDate: string; finishesAt: Date | null; dueDateMet: boolean; notes: string[] };
export type Plan = { sessions: PlannedSession[]; jobs: JobPlan[] };

const slotMs = 15 * 60_000;
const ceilToSlot = (t: number) => Math.ceil(t / slotMs) * slotMs;
const overlaps = (a: { start: Date; end: Date }, b: { start: Date; end: Date }) => a.start < b.end && b.start < a.end;

type State = { busy: Interval[]; rackLoad: RackLoad[] };

function rackFits(state: State, input: PlanInput, from: Date, until: Date, areaM2: number): boolean {
  // Peak load over the interval is reached at one of the loads' starts (or at `from`).
  const starts = [from, ...state.rackLoad.filter((l) => l.from > from && l.from < until).map((l) => l.from)];
  return starts.every((t) => state.rackLoad.filter((l) => l.from <= t && t < l.until).reduce((sum, l) => sum + l.areaM2, 0) + areaM2 <= input.rackCapacityM2);
}

/** The earliest booth slot from `earliest` that is open, free, and leaves rack space until handling. */
function findSlot(input: PlanInput, state: State, earliest: Date, areaM2: number, footprintM2: number, handleMin: number): Interval | null {
  const horizon = input.now.getTime() + input.horizonDays * 86_400_000;
  for (let t = ceilToSlot(earliest.getTime()); t < horizon; t += slotMs) {
    for (const booth of input.booths) {
      const slot = { boothId: booth.id, start: new Date(t), end: new Date(t + sessionMinutesFor(input, booth, areaM2) * 60_000) };
      if (slot.end.getTime() > horizon || openingHoursProblem(slot.start, slot.end, booth.openingHours, input.timeZone)) continue;
      if (state.busy.some((b) => b.boothId === booth.id && overlaps(b, slot))) continue;
      if (!rackFits(state, input, slot.end, new Date(slot.end.getTime() + handleMin * 60_000), footprintM2)) continue;
      return slot;
    }
  }
  return null;
}

// Each booth turns the area into its own session length at its spray rate.
function sessionMinutesFor(input: PlanInput, booth: PlanBooth, areaM2: number): number {
  return sessionMinutes({ areaM2, sprayRateM2PerH: booth.sprayRateM2PerH, setupMin: input.setupMin, cleanDownMin: input.cleanDownMin });
}

function planJob(input: PlanInput, state: State, job: PlanJob): { sessions: PlannedSession[]; plan: JobPlan } {
  const notes: string[] = [];
  const sessions: PlannedSession[] = [];
  let window = job.lastWindow;
  let ready = input.now;
  let finishesAt: Date | null = null;
  for (const step of job.remaining) {
    if (step.kind === 'abrade') {
      ready = new Date(Math.max(ready.getTime(), window?.opensAt.getTime() ?? 0) + input.abradeMin * 60_000);
      window = window ? { opensAt: window.opensAt, closesAt: null } : null;
      continue;
    }
    const times = adjustDryingTimes(step.dryingTimes, input.planningTempC).times;
    const earliest = new Date(Math.max(ready.getTime(), window?.opensAt.getTime() ?? 0));
    let slot = findSlot(input, state, earliest, job.areaM2, job.footprintM2, times.handleMin);
    if (slot && window?.closesAt && slot.start > window.closesAt) {
      notes.push(`Step ${step.position + 1}: no booth time before the recoat window closes (${window.closesAt.toISOString()}); the plan adds a P320 denib first.`);
      slot = findSlot(input, state, new Date(earliest.getTime() + input.abradeMin * 60_000), job.areaM2, job.footprintM2, times.handleMin);
    }
    if (!slot) {
      notes.push(`Step ${step.position + 1} (${step.productName}): no free booth time with rack space in the next ${input.horizonDays} days.`);
      return { sessions, plan: { jobId: job.id, reference: job.reference, dueDate: job.dueDate, finishesAt: null, dueDateMet: false, notes } };
    }
    const end = slot.end.getTime();
    sessions.push({ jobId: job.id, stepPosition: step.position, boothId: slot.boothId, start: slot.start, end: slot.end, productName: step.productName, areaM2: job.areaM2, partIds: job.partIds });
    state.busy.push(slot);
    state.rackLoad.push({ from: slot.end, until: new Date(end + times.handleMin * 60_000), areaM2: job.footprintM2 });
    window = { opensAt: new Date(end + times.recoatMinMin * 60_000), closesAt: times.recoatMaxMin === null ? null : new Date(end + times.recoatMaxMin * 60_000) };
    ready = slot.end;
    finishesAt = new Date(end + times.packMin * 60_000);
  }
  const dueDateMet = finishesAt !== null && calendarDateIn(finishesAt, input.timeZone) <= job.dueDate;
  if (finishesAt && !dueDateMet) notes.push(`Ready to pack ${calendarDateIn(finishesAt, input.timeZone)}, after the due date ${job.dueDate}.`);
  return { sessions, plan: { jobId: job.id, reference: job.reference, dueDate: job.dueDate, finishesAt, dueDateMet, notes } };
}

/**
 * Puts each job's remaining steps into free booth time, earliest due date first: every coat
 * after the previous one's recoat window opens (at the planning temperature) and, where it can,
 * before it closes; inside opening hours; with rack space until the parts can be handled.
 */
export function autoPlan(input: PlanInput): Plan {
  const state: State = { busy: [...input.busy], rackLoad: [...input.rackLoad] };
  const ordered = [...input.jobs].sort((a, b) => a.dueDate.localeCompare(b.dueDate) || a.id - b.id);
  const results = ordered.map((job) => planJob(input, state, job));
  return { sessions: results.flatMap((r) => r.sessions), jobs: results.map((r) => r.plan) };
}
