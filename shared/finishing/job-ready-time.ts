import { adjustDryingTimes } from './drying-times';
import { latestCoat, partReadiness, type FinishStep, type PartReadiness, type ReadinessInput } from './readiness';
import { defaultAbradeMin, shortestTimeThroughSystem, type ProductDryingTable, type SystemTimeStep } from './system-time';
import { requireFinite } from './validate';
import type { FinishingWarning } from './warnings';

/** A spray session booked for the part: when it starts, and which step it plans (null: "its next coat"). */
export type PartBooking = { startAt: Date; stepIndex: number | null };

export type PartReadyInput = ReadinessInput & {
  /** Sessions still to run that plan the part: its next coat goes on no earlier than the first one for that step. */
  bookings?: PartBooking[];
};

export type ReadyTimeOptions = {
  /** Product id → its drying table, for every coat step still to go on. */
  tables: ReadonlyMap<number, ProductDryingTable>;
  /** The shop's expected drying temperature for coats not yet sprayed. */
  tempC: number;
  abradeMin?: number;
};

export type PartReadyTime = {
  readiness: PartReadiness;
  /** Coat steps of the finish system still to go on. */
  coatsRemaining: number;
  /** When the next coat can go on at the earliest; null when no coat remains. */
  nextCoatAt: Date | null;
  handleAt: Date | null;
  packAt: Date | null;
  /** True when the times count coats not yet sprayed (an estimate); false when they are the last coat's own. */
  projected: boolean;
  /** No time can be given: the part has no finish system, or a product's drying times are missing. */
  unknown: boolean;
  warnings: FinishingWarning[];
};

const minuteMs = 60_000;
const later = (a: Date, b: Date | null | undefined) => (b && b.getTime() > a.getTime() ? b : a);
const plus = (at: Date, minutes: number) => new Date(at.getTime() + minutes * minuteMs);

/** Coat steps not yet on the part, from the first one past its latest coat. */
function remainingCoatSteps(steps: FinishStep[], input: ReadinessInput): number[] {
  const done = new Set(input.coats.map((coat) => coat.stepIndex));
  const from = latestCoat(input.coats)?.stepIndex ?? -1;
  return steps.flatMap((step, index) => (step.kind === 'coat' && index > from && !done.has(index) ? [index] : []));
}

/** When the next coat may go on: once its window opens (never before now), after any denib it needs, not before its booked session. */
function nextCoatStart(input: PartReadyInput, readiness: PartReadiness, nextCoat: number, abradeMin: number): Date {
  const last = latestCoat(input.coats);
  const opens = readiness.nextWindow?.opensAt ?? last?.recoatOpensAt ?? input.now;
  const start = later(input.now, opens);
  const booked = (input.bookings ?? [])
    .filter((b) => b.stepIndex === null || b.stepIndex === nextCoat)
    .sort((a, b) => a.startAt.getTime() - b.startAt.getTime())[0];
  return later(readiness.abradeRequired ? plus(start, abradeMin) : start, booked?.startAt);
}

/**
 * When one part can be handled and packed: from its last coat when every coat is on, else an
 * estimate with each remaining coat going on as soon as its recoat window opens, at the shop's
 * expected drying temperature (DESIGN.md §4.1 and §4.8).
 */
export function partReadyTime(input: PartReadyInput, options: ReadyTimeOptions): PartReadyTime {
  requireFinite('tempC', options.tempC, 'the expected drying temperature');
  const readiness = partReadiness(input);
  const remaining = remainingCoatSteps(input.steps, input);
  const none = { readiness, coatsRemaining: remaining.length, nextCoatAt: null, warnings: [] };
  if (readiness.coatsTotal === 0) {
    // No finish system: the coats on record (if any) give the times; what else is to come is unknown.
    const known = readiness.handleAt !== null;
    return { ...none, handleAt: readiness.handleAt, packAt: readiness.packAt, projected: false, unknown: !known };
  }
  if (remaining.length === 0) return { ...none, handleAt: readiness.handleAt, packAt: readiness.packAt, projected: false, unknown: false };
  const tail = input.steps.slice(remaining[0]).flatMap((step, offset): SystemTimeStep[] => {
    const index = remaining[0] + offset;
    if (step.kind === 'abrade') return [{ kind: 'abrade', grit: step.grit }];
    return remaining.includes(index) ? [{ kind: 'coat', productId: step.productId }] : [];
  });
  const lastCoat = input.steps[remaining[remaining.length - 1]];
  const table = lastCoat.kind === 'coat' ? options.tables.get(lastCoat.productId) : undefined;
  if (!table || tail.some((step) => step.kind === 'coat' && !options.tables.has(step.productId))) {
    return { ...none, handleAt: null, packAt: null, projected: true, unknown: true };
  }
  const abradeMin = options.abradeMin ?? defaultAbradeMin;
  const through = shortestTimeThroughSystem(tail, options.tables, options.tempC, { abradeMin });
  const last = through.perStep.filter((step) => step.kind === 'coat').at(-1)!;
  const handleMin = adjustDryingTimes(table.dryingTimes, options.tempC).times.handleMin;
  const start = nextCoatStart(input, readiness, remaining[0], abradeMin);
  return {
    ...none,
    nextCoatAt: start,
    handleAt: plus(start, through.totalMin - last.minutes + handleMin),
    packAt: plus(start, through.totalMin),
    projected: true,
    unknown: false,
    warnings: through.warnings,
  };
}

export type JobReadyTime = {
  /** When every part not yet collected can be handled; null when a part's time is unknown or none is left. */
  handleAt: Date | null;
  packAt: Date | null;
  coatsRemaining: number;
  partsCounted: number;
  partsCollected: number;
  partsUnknown: number;
  /** Some part still needs coats, so the times are an estimate. */
  projected: boolean;
  /** Which input part sets the handle time (the last to be ready); null when there is none. */
  lastPartIndex: number | null;
  warnings: FinishingWarning[];
};

/** The job is ready to handle (or pack) when its last part is: the latest of its parts' times. */
export function jobReadyTime(parts: PartReadyInput[], options: ReadyTimeOptions): JobReadyTime {
  return jobReadyTimeOf(parts.map((part) => partReadyTime(part, options)));
}

/** The same from each part's ready time already worked out (the board has them for its own parts). */
export function jobReadyTimeOf(times: PartReadyTime[]): JobReadyTime {
  const live = times.map((time, index) => ({ time, index })).filter(({ time }) => time.readiness.state !== 'collected');
  const unknown = live.filter(({ time }) => time.unknown).length;
  const latest = (pick: (t: PartReadyTime) => Date | null) =>
    live.reduce<{ at: Date; index: number } | null>((max, { time, index }) => {
      const at = pick(time);
      return at && (!max || at.getTime() > max.at.getTime()) ? { at, index } : max;
    }, null);
  const handle = unknown ? null : latest((t) => t.handleAt);
  const pack = unknown ? null : latest((t) => t.packAt);
  const warnings = live.flatMap(({ time }) => time.warnings).filter((w, i, all) => all.findIndex((o) => o.code === w.code && o.message === w.message) === i);
  return {
    handleAt: handle?.at ?? null,
    packAt: pack?.at ?? null,
    coatsRemaining: live.reduce((sum, { time }) => sum + time.coatsRemaining, 0),
    partsCounted: live.length,
    partsCollected: times.length - live.length,
    partsUnknown: unknown,
    projected: live.some(({ time }) => time.projected),
    lastPartIndex: handle?.index ?? null,
    warnings,
  };
}
