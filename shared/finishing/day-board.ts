import type { SpraySessionState } from '../schemas/spray-session';

/** What the person at the booth does next, in words; `at` is a time the words lead up to (the client shows it in shop time). */
export type NextStepKind = 'checklist' | 'checklist-stop' | 'start-spraying' | 'mix' | 'coat' | 'stop-spraying' | 'clearance' | 'finish' | 'done' | 'cancelled';
export type NextStep = { kind: NextStepKind; words: string; at: Date | null };

export type NextStepCoat = { coatNumber: number; coatsTotal: number; productName: string; partCount: number; sprayedCount: number; needsMix: boolean; mixed: boolean };
export type NextStepInput = {
  state: SpraySessionState;
  checklist: { verdict: 'go' | 'caution' | 'stop'; overrideReason: string | null } | null;
  /** The coats the session sprays, in the order they go on. */
  coats: NextStepCoat[];
  /** When the booth air is clear after spraying stopped (clearing start + the booth's clearance time). */
  clearanceEndsAt: Date | null;
  now: Date;
};

const parts = (n: number) => `${n} part${n === 1 ? '' : 's'}`;

function whileSpraying(coats: NextStepCoat[]): NextStep {
  const next = coats.find((c) => c.sprayedCount < c.partCount);
  if (!next) {
    if (coats.length === 0) return { kind: 'coat', words: 'Record each coat as it goes on', at: null };
    return { kind: 'stop-spraying', words: 'Every planned part is sprayed: stop spraying to start the clearance countdown', at: null };
  }
  if (next.needsMix && !next.mixed) return { kind: 'mix', words: `Mix ${next.productName} (no pot in its pot life yet)`, at: null };
  const left = next.partCount - next.sprayedCount;
  return { kind: 'coat', words: `Coat ${next.coatNumber} of ${next.coatsTotal}: ${next.productName} on ${parts(left)}`, at: null };
}

/**
 * The one next thing to do in a session, following the order the booth works in: checklist
 * (a stop needs a lead), spray each coat from a pot in its pot life, stop, wait out the
 * clearance time with protection on, finish. A session not started whose parts have all had
 * their coat elsewhere has nothing left to do.
 */
export function sessionNextStep(input: NextStepInput): NextStep {
  const { state, checklist } = input;
  if (state === 'done') return { kind: 'done', words: 'Done', at: null };
  if (state === 'cancelled') return { kind: 'cancelled', words: 'Cancelled', at: null };
  if (state === 'clearing') {
    if (input.clearanceEndsAt && input.now < input.clearanceEndsAt) return { kind: 'clearance', words: 'Clearing the air: keep protection on and others out until', at: input.clearanceEndsAt };
    return { kind: 'finish', words: 'The air is clear: finish the session', at: null };
  }
  if (state === 'spraying') return whileSpraying(input.coats);
  // Its parts had the coat in another session (a second coat sprayed straight after the first): nothing is left to spray here.
  if (input.coats.length > 0 && input.coats.every((c) => c.sprayedCount >= c.partCount)) {
    return { kind: 'done', words: 'Nothing left to spray: every planned part has had its coat. Ask the lead to cancel or re-plan this session', at: null };
  }
  if (!checklist) return { kind: 'checklist', words: 'Run the pre-spray checklist', at: null };
  if (checklist.verdict === 'stop' && !checklist.overrideReason) return { kind: 'checklist-stop', words: 'The checklist says stop: put it right, or ask the lead', at: null };
  return { kind: 'start-spraying', words: 'Checklist done: start spraying', at: null };
}

/** How far ahead a job's earliest plan is looked for when judging whether it is at risk. */
export const riskHorizonDays = 28;

export type JobRiskReason = 'overdue' | 'finishes-late' | 'cannot-plan';
export type JobRisk = { reason: JobRiskReason; words: string };

export type JobRiskInput = {
  /** Shop dates, YYYY-MM-DD. */
  dueDate: string;
  today: string;
  /** The job's earliest finish: ready to pack, from its coats, its bookings and free booth time; null when no plan fits. */
  readyToPackOn: string | null;
  /** False when the job has nothing left to spray (only packing or collecting remains). */
  coatsLeft: boolean;
};

/**
 * Whether a job may miss its due date: already past it, or its earliest plan (coats on record,
 * sessions booked, then the first free booth time) packs after it, or no plan fits at all.
 */
export function jobRisk({ dueDate, today, readyToPackOn, coatsLeft }: JobRiskInput): JobRisk | null {
  if (dueDate < today) return { reason: 'overdue', words: `Overdue: it was due ${dueDate}` };
  if (!coatsLeft) return null;
  if (readyToPackOn === null) return { reason: 'cannot-plan', words: `Its remaining coats do not fit into the next ${riskHorizonDays} days of booth time as it is booked now` };
  if (readyToPackOn > dueDate) return { reason: 'finishes-late', words: `Ready to pack ${readyToPackOn} at the earliest, after the due date` };
  return null;
}

/**
 * Minutes after which a booth sensor's last reading is too old to trust the conditions on screen.
 * Common practice, no published source: sensors post every few minutes, so half an hour is a fault.
 */
export const staleReadingMin = 30;

/** A booth sensor is stale when it has never posted, or not within `staleReadingMin`. */
export function sensorIsStale(lastReadingAt: Date | null, now: Date, maxAgeMin = staleReadingMin): boolean {
  return lastReadingAt === null || now.getTime() - lastReadingAt.getTime() > maxAgeMin * 60_000;
}
