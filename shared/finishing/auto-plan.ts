import { calendarDateIn } from '../time';
import { findSlot, type Interval, type RackLoad, type SlotContext, type Taken } from './auto-plan-slots';
import type { DryingRow } from './drying-row-schema';
import { adjustDryingTimes } from './drying-times';
import { missedWindowScuffGrit, type RecoatWindow } from './readiness';
import { projectedRecoatWindow, sharedRecoatWindow } from './recoat-window';
import { calendarDateWords, coatOfWords, denibWords, shopMomentWords, upperFirst } from '../words';

export type { PlanBooth } from './auto-plan-slots';
export type PlanStep = { position: number; kind: 'coat'; productName: string; dryingTimes: DryingRow[] } | { position: number; kind: 'abrade'; grit: string };

/** A coat already on record on a part: the step it was, and the times it left. */
export type RecordedCoat = { stepPosition: number; recoatOpensAt: Date; recoatClosesAt: Date | null; packAt: Date };
export type PlanPart = {
  id: number;
  /** Coated area sprayed per coat, m². */
  areaM2: number;
  /** Shelf area the part takes lying flat, m². */
  footprintM2: number;
  coats: RecordedCoat[];
};
/** A live session (booked ahead, or under way) that already plans a step on some of the job's parts. */
export type BookedStep = { stepPosition: number; start: Date; end: Date; partIds: number[] };
export type PlanJob = {
  id: number;
  reference: string;
  dueDate: string;
  /** The whole finish system, in order; steps on record or booked are not proposed again. */
  steps: PlanStep[];
  parts: PlanPart[];
  booked: BookedStep[];
};

export type PlanInput = SlotContext & {
  /** The shop's locale for times in the notes (BCP 47); en-GB when not given. */
  locale?: string;
  planningTempC: number;
  /** Time to denib between coats, off the booth: common practice, no published source. */
  abradeMin: number;
  busy: Interval[];
  rackLoad: RackLoad[];
  jobs: PlanJob[];
};

export type PlannedSession = {
  jobId: number;
  stepPosition: number;
  /** "Coat n of m": the step's place among the job's coat steps, and how many there are. */
  coatNumber: number;
  coatsTotal: number;
  /** The grit of the denib the parts need before this coat (the system's own, or a scuff after a closed window); null when none. */
  denibBeforeGrit: string | null;
  boothId: number;
  start: Date;
  end: Date;
  productName: string;
  areaM2: number;
  partIds: number[];
};
export type JobPlan = { jobId: number; reference: string; dueDate: string; finishesAt: Date | null; dueDateMet: boolean; notes: string[] };
export type Plan = { sessions: PlannedSession[]; jobs: JobPlan[] };

type CoatStep = Extract<PlanStep, { kind: 'coat' }>;
/** Where each part stands as the plan walks the finish system: its open window, when it is free, when it can be packed. */
type PartState = { window: RecoatWindow | null; freeAt: Date; packAt: Date | null };
type JobWalk = { job: PlanJob; parts: Map<number, PartState>; abradeDue: boolean; denibGrit: string; sessions: PlannedSession[]; notes: string[] };

const later = (a: Date, b: Date | null | undefined) => (b && b > a ? b : a);
const shopTime = (at: Date, input: PlanInput) => shopMomentWords(at, { timeZone: input.timeZone, locale: input.locale ?? 'en-GB' });

function coatPlace(job: PlanJob, step: { position: number }): { coatNumber: number; coatsTotal: number } {
  const coats = job.steps.filter((s) => s.kind === 'coat').map((s) => s.position);
  return { coatNumber: coats.indexOf(step.position) + 1, coatsTotal: coats.length };
}

/** "Coat 2 of 3": the step's place among the job's coat steps, as the other screens say it. */
function coatLabel(job: PlanJob, step: { position: number }): string {
  const { coatNumber, coatsTotal } = coatPlace(job, step);
  return upperFirst(coatOfWords(coatNumber, coatsTotal));
}

/** The parts whose step `position` is on record, booked, or still to be planned. */
function split(walk: JobWalk, position: number) {
  const recorded = new Map(walk.job.parts.flatMap((p) => p.coats.filter((c) => c.stepPosition === position).map((c) => [p.id, c] as const)));
  const booked = walk.job.booked.filter((b) => b.stepPosition === position && b.partIds.some((id) => !recorded.has(id)));
  const bookedIds = new Set(booked.flatMap((b) => b.partIds));
  const needing = walk.job.parts.filter((p) => !recorded.has(p.id) && !bookedIds.has(p.id));
  return { recorded, booked, needing };
}

function followBooked(input: PlanInput, walk: JobWalk, step: CoatStep, booked: BookedStep[], recorded: Map<number, RecordedCoat>): void {
  for (const session of booked) {
    const after = projectedRecoatWindow(session.end, step.dryingTimes, input.planningTempC);
    const before = sharedRecoatWindow(session.partIds.flatMap((id) => walk.parts.get(id)?.window ?? []));
    walk.notes.push(`${coatLabel(walk.job, step)} (${step.productName}) is already booked ${shopTime(session.start, input)}; not proposed again.`);
    if (before && session.start < before.opensAt) walk.notes.push(`That session starts before the previous coat’s recoat window opens (${shopTime(before.opensAt, input)}).`);
    if (before?.closesAt && session.start > before.closesAt) walk.notes.push(`That session starts after the previous coat’s recoat window closes (${shopTime(before.closesAt, input)}): denib first.`);
    for (const id of session.partIds) {
      if (!recorded.has(id)) walk.parts.set(id, { window: after, freeAt: session.end, packAt: after.packAt });
    }
  }
}

/** Books the parts still needing this coat into the earliest free slot; false when none is found. */
function proposeStep(input: PlanInput, taken: Taken, walk: JobWalk, step: CoatStep, needing: PlanPart[]): boolean {
  const times = adjustDryingTimes(step.dryingTimes, input.planningTempC).times;
  const states = needing.map((p) => walk.parts.get(p.id)!);
  const window = sharedRecoatWindow(states.flatMap((s) => s.window ?? []));
  const abrade = walk.abradeDue ? input.abradeMin * 60_000 : 0;
  const earliest = new Date(Math.max(input.now.getTime(), ...states.map((s) => s.freeAt.getTime()), window?.opensAt.getTime() ?? 0) + abrade);
  const areaM2 = needing.reduce((sum, p) => sum + p.areaM2, 0);
  const footprintM2 = needing.reduce((sum, p) => sum + p.footprintM2, 0);
  let slot = findSlot(input, taken, earliest, areaM2, footprintM2, times.handleMin);
  let denibBeforeGrit = walk.abradeDue ? walk.denibGrit : null;
  if (slot && !walk.abradeDue && window?.closesAt && slot.start > window.closesAt) {
    denibBeforeGrit = missedWindowScuffGrit;
    walk.notes.push(`${coatLabel(walk.job, step)} (${step.productName}): no booth time before the recoat window closes (${shopTime(window.closesAt, input)}); the plan adds a ${denibWords(missedWindowScuffGrit)} first.`);
    slot = findSlot(input, taken, new Date(earliest.getTime() + input.abradeMin * 60_000), areaM2, footprintM2, times.handleMin);
  }
  if (!slot) {
    walk.notes.push(`${coatLabel(walk.job, step)} (${step.productName}): no free booth time with rack space in the next ${input.horizonDays} days.`);
    return false;
  }
  const partIds = needing.map((p) => p.id);
  walk.sessions.push({ jobId: walk.job.id, stepPosition: step.position, ...coatPlace(walk.job, step), denibBeforeGrit, boothId: slot.boothId, start: slot.start, end: slot.end, productName: step.productName, areaM2, partIds });
  taken.busy.push(slot);
  taken.rackLoad.push({ from: slot.end, until: new Date(slot.end.getTime() + times.handleMin * 60_000), areaM2: footprintM2 });
  const after = projectedRecoatWindow(slot.end, step.dryingTimes, input.planningTempC);
  for (const id of partIds) walk.parts.set(id, { window: after, freeAt: slot.end, packAt: after.packAt });
  return true;
}

function walkCoat(input: PlanInput, taken: Taken, walk: JobWalk, step: CoatStep): boolean {
  const { recorded, booked, needing } = split(walk, step.position);
  for (const [id, coat] of recorded) {
    const state = walk.parts.get(id)!;
    walk.parts.set(id, { window: { opensAt: coat.recoatOpensAt, closesAt: coat.recoatClosesAt }, freeAt: state.freeAt, packAt: coat.packAt });
  }
  followBooked(input, walk, step, booked, recorded);
  const done = needing.length === 0 || proposeStep(input, taken, walk, step, needing);
  walk.abradeDue = false;
  return done;
}

function planJob(input: PlanInput, taken: Taken, job: PlanJob): { sessions: PlannedSession[]; plan: JobPlan } {
  const walk: JobWalk = { job, parts: new Map(job.parts.map((p) => [p.id, { window: null, freeAt: input.now, packAt: null }])), abradeDue: false, denibGrit: missedWindowScuffGrit, sessions: [], notes: [] };
  const unplanned = (): JobPlan => ({ jobId: job.id, reference: job.reference, dueDate: job.dueDate, finishesAt: null, dueDateMet: false, notes: walk.notes });
  for (const step of job.steps) {
    if (step.kind === 'abrade') {
      walk.abradeDue = true;
      walk.denibGrit = step.grit;
      continue;
    }
    if (!walkCoat(input, taken, walk, step)) return { sessions: walk.sessions, plan: unplanned() };
  }
  const packTimes = [...walk.parts.values()].map((s) => s.packAt);
  const finishesAt = packTimes.some((t) => t === null) ? null : packTimes.reduce<Date | null>((a, b) => (a ? later(a, b) : b), null);
  const dueDateMet = finishesAt !== null && calendarDateIn(finishesAt, input.timeZone) <= job.dueDate;
  if (finishesAt && !dueDateMet) walk.notes.push(`Ready to pack ${shopTime(finishesAt, input)}, after the due date ${calendarDateWords(job.dueDate, input.locale ?? 'en-GB')}.`);
  return { sessions: walk.sessions, plan: { jobId: job.id, reference: job.reference, dueDate: job.dueDate, finishesAt, dueDateMet, notes: walk.notes } };
}

/**
 * Puts each job's steps that are neither on record nor already booked into free booth time,
 * earliest due date first. Every part starts from its own coats on record and its live bookings:
 * a booked step is not proposed again, and the next coat waits for the recoat window that booking
 * will open (at the planning temperature); each coat goes in where it can before the window
 * closes, inside opening hours, with rack space until the parts can be handled.
 */
export function autoPlan(input: PlanInput): Plan {
  const taken: Taken = { busy: [...input.busy], rackLoad: [...input.rackLoad] };
  const ordered = [...input.jobs].sort((a, b) => a.dueDate.localeCompare(b.dueDate) || a.id - b.id);
  const results = ordered.map((job) => planJob(input, taken, job));
  return { sessions: results.flatMap((r) => r.sessions), jobs: results.map((r) => r.plan) };
}
