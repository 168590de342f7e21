import { FinishingInputError } from '../errors';
import type { CoatInstants } from './coat-times';
import { requireInstant } from './validate';

export type FinishStep = { kind: 'coat'; productId: number; dryFilmUm: number } | { kind: 'abrade'; grit: string };

/** One coat a part has received: which step of its finish system, and the instants it produced. */
export type PartCoat = CoatInstants & { stepIndex: number; sprayedAt: Date };

export const readinessStates = [
  'waiting',
  'in-finish',
  'drying',
  'ready-to-handle',
  'ready-to-pack',
  'cured',
  'collected',
] as const;
export type ReadinessState = (typeof readinessStates)[number];

export type ReadinessInput = {
  steps: FinishStep[];
  coats: PartCoat[];
  /**
   * Coats on record that match no coat step of the finish system (the job has none, or had none
   * when they were sprayed). A part whose job has no finish system takes its state and its handle,
   * pack and cure times from the latest of them; with a system they are not counted.
   */
  unplannedCoats?: (CoatInstants & { sprayedAt: Date })[];
  /** When the part was denibbed or scuffed (denib records); only an abrade after the latest coat counts, or any before the first. */
  abradedAt?: Date[];
  collectedAt?: Date | null;
  now: Date;
};

export type RecoatWindow = { opensAt: Date; closesAt: Date | null };

export type PartReadiness = {
  state: ReadinessState;
  coatsDone: number;
  coatsTotal: number;
  nextStep: FinishStep | null;
  /** Index of `nextStep` in the finish system; null when the step was inserted (a scuff after a missed window). */
  nextStepIndex: number | null;
  /** When the next coat may go on; null when there is none, or when the surface must be abraded first. */
  nextWindow: RecoatWindow | null;
  abradeRequired: boolean;
  recoatWindowMissed: boolean;
  handleAt: Date | null;
  packAt: Date | null;
  fullCureAt: Date | null;
};

/** Grit for scuffing a film whose recoat window has closed, giving the next coat a mechanical key (trade practice P320–P400). */
export const missedWindowScuffGrit = 'P320';

type NextMove = Pick<PartReadiness, 'nextStep' | 'nextStepIndex' | 'nextWindow' | 'abradeRequired' | 'recoatWindowMissed'>;

/** Where a part stands in its finish system at `now`, from the coats it has had. */
export function partReadiness(input: ReadinessInput): PartReadiness {
  const { steps, coats, now } = input;
  requireInstant('now', now, 'the time now');
  checkCoats(steps, coats);
  const coatSteps = steps.flatMap((step, index) => (step.kind === 'coat' ? [index] : []));
  const doneSteps = new Set(coats.map((coat) => coat.stepIndex));
  const last = latestCoat(coats);
  const collected = input.collectedAt != null && input.collectedAt.getTime() <= now.getTime();
  const shared = {
    coatsDone: doneSteps.size,
    coatsTotal: coatSteps.length,
    handleAt: last?.handleAt ?? null,
    packAt: last?.packAt ?? null,
    fullCureAt: last?.fullCureAt ?? null,
  };
  if (coatSteps.length === 0 && input.unplannedCoats?.length) return withoutSystem(input.unplannedCoats, collected, now);
  if (!last) return { ...shared, ...beforeFirstCoat(input), state: collected ? 'collected' : 'waiting' };
  const nextCoat = coatSteps.find((index) => index > last.stepIndex && !doneSteps.has(index));
  if (nextCoat === undefined) {
    const move = { nextStep: null, nextStepIndex: null, nextWindow: null, abradeRequired: false, recoatWindowMissed: false };
    return { ...shared, ...move, state: collected ? 'collected' : dryingStateAt(last, now) };
  }
  return { ...shared, ...betweenCoats(input, last, nextCoat), state: collected ? 'collected' : 'in-finish' };
}

/** A part with no finish system: its coats still dry, so it is handled, packed and cured from the latest one. */
function withoutSystem(coats: NonNullable<ReadinessInput['unplannedCoats']>, collected: boolean, now: Date): PartReadiness {
  coats.forEach((coat, i) => requireInstant(`unplannedCoats.${i}.sprayedAt`, coat.sprayedAt, 'when the coat was sprayed'));
  const last = coats.reduce((latest, coat) => (coat.sprayedAt.getTime() > latest.sprayedAt.getTime() ? coat : latest));
  return {
    state: collected ? 'collected' : dryingStateAt(last, now),
    coatsDone: coats.length,
    coatsTotal: 0,
    nextStep: null,
    nextStepIndex: null,
    nextWindow: null,
    abradeRequired: false,
    recoatWindowMissed: false,
    handleAt: last.handleAt,
    packAt: last.packAt,
    fullCureAt: last.fullCureAt,
  };
}

/** A system that starts by sanding the bare part asks for that first, until a sanding is on record. */
function beforeFirstCoat({ steps, abradedAt = [], now }: ReadinessInput): NextMove {
  const first = steps[0] ?? null;
  const sanded = abradedAt.some((at) => at.getTime() <= now.getTime());
  const firstCoat = steps.findIndex((step) => step.kind === 'coat');
  if (first?.kind === 'abrade' && sanded && firstCoat >= 0) {
    return { nextStep: steps[firstCoat], nextStepIndex: firstCoat, nextWindow: null, abradeRequired: false, recoatWindowMissed: false };
  }
  return { nextStep: first, nextStepIndex: first ? 0 : null, nextWindow: null, abradeRequired: first?.kind === 'abrade', recoatWindowMissed: false };
}

function betweenCoats({ steps, abradedAt = [], now }: ReadinessInput, last: PartCoat, nextCoat: number): NextMove {
  const missed = recoatWindowClosed(last.recoatClosesAt, now);
  const abraded = abradedAt
    .filter((at) => at.getTime() > last.sprayedAt.getTime() && at.getTime() <= now.getTime())
    .sort((a, b) => a.getTime() - b.getTime())
    .at(-1);
  if (abraded) {
    // A sanded surface gives the next coat a mechanical key, so no closing time applies any more.
    // The film must still be ready to recoat: the opening stays the coat's own (sanding is already past).
    return { nextStep: steps[nextCoat], nextStepIndex: nextCoat, nextWindow: { opensAt: last.recoatOpensAt, closesAt: null }, abradeRequired: false, recoatWindowMissed: missed };
  }
  const window = missed ? null : { opensAt: last.recoatOpensAt, closesAt: last.recoatClosesAt };
  const plannedAbrade = steps.findIndex((step, index) => index > last.stepIndex && index < nextCoat && step.kind === 'abrade');
  if (plannedAbrade >= 0) {
    return { nextStep: steps[plannedAbrade], nextStepIndex: plannedAbrade, nextWindow: window, abradeRequired: true, recoatWindowMissed: missed };
  }
  if (missed) {
    const scuff: FinishStep = { kind: 'abrade', grit: missedWindowScuffGrit };
    return { nextStep: scuff, nextStepIndex: null, nextWindow: null, abradeRequired: true, recoatWindowMissed: true };
  }
  return { nextStep: steps[nextCoat], nextStepIndex: nextCoat, nextWindow: window, abradeRequired: false, recoatWindowMissed: false };
}

/** The last coat's times that move a part along once every coat is on. */
export type DryingInstants = { handleAt: Date | null; packAt: Date | null; fullCureAt: Date | null };

const afterLastCoat: readonly ReadinessState[] = ['drying', 'ready-to-handle', 'ready-to-pack', 'cured'];

/** Where a part with every coat on stands at `now`: each state begins at its instant. */
export function dryingStateAt(times: DryingInstants, now: Date): ReadinessState {
  const passed = (at: Date | null) => at !== null && at.getTime() <= now.getTime();
  if (passed(times.fullCureAt)) return 'cured';
  if (passed(times.packAt)) return 'ready-to-pack';
  return passed(times.handleAt) ? 'ready-to-handle' : 'drying';
}

/**
 * A state worked out earlier (the server's answer), moved on to `now`: a drying part becomes
 * ready as its instants pass, never going back; every other state stays until the next answer.
 */
export function readinessMovedOn(state: ReadinessState, times: DryingInstants, now: Date): ReadinessState {
  const from = afterLastCoat.indexOf(state);
  if (from < 0) return state;
  return afterLastCoat[Math.max(from, afterLastCoat.indexOf(dryingStateAt(times, now)))];
}

/** A recoat window has closed once its closing instant is reached; a window with no closing time never closes. */
export function recoatWindowClosed(closesAt: Date | null, now: Date): boolean {
  return closesAt !== null && now.getTime() >= closesAt.getTime();
}

/** The coat furthest along the finish system; a re-spray of the same step counts from its latest spraying. */
export function latestCoat(coats: PartCoat[]): PartCoat | undefined {
  return coats.reduce<PartCoat | undefined>((latest, coat) => {
    if (!latest || coat.stepIndex > latest.stepIndex) return coat;
    if (coat.stepIndex === latest.stepIndex && coat.sprayedAt.getTime() > latest.sprayedAt.getTime()) return coat;
    return latest;
  }, undefined);
}

function checkCoats(steps: FinishStep[], coats: PartCoat[]): void {
  coats.forEach((coat, i) => {
    requireInstant(`coats.${i}.sprayedAt`, coat.sprayedAt, 'when the coat was sprayed');
    if (steps[coat.stepIndex]?.kind !== 'coat') {
      throw new FinishingInputError(`coats.${i}.stepIndex`, 'This coat does not match a coat step of the finish system');
    }
  });
}
