import type { RespiratorLevel } from './cautions';
import { dueStatus, type DueStatus, type FilterStatus } from './upkeep-due';

/**
 * Fit to spray: whether a booth's upkeep and the assigned sprayer's protection records allow a
 * spray session. Each check names its rule beside it. A stop blocks spraying unless a lead
 * overrides it with a reason; a caution is shown and recorded with the checks. None of this
 * replaces the product's safety data sheet, local regulations or a competent person's advice.
 */
export type FitnessSeverity = 'stop' | 'caution';
export interface FitnessFinding {
  code: string;
  subject: 'booth' | 'sprayer';
  severity: FitnessSeverity;
  message: string;
  /** Where the rule comes from, in words (a published source, or common practice). */
  rule: string;
}
export interface FitnessAssessment {
  verdict: 'go' | 'caution' | 'stop';
  findings: FitnessFinding[];
}

/** One dated record: when it is next due, and whether it passed (fit tests and fire inspections). */
export interface DatedRecord {
  nextDueOn: string | null;
  passed: boolean;
}
export interface BoothUpkeepFacts {
  banks: { name: string; status: FilterStatus; currentPa: number | null; changeAtPa: number }[];
  extractionTest: (DatedRecord & { meanFaceVelocityMps: number; minFaceVelocityMps: number }) | null;
  fireInspection: DatedRecord | null;
}
export interface SprayerFacts {
  fitTest: DatedRecord | null;
  surveillance: DatedRecord | null;
  /** The latest record of each training, by what it was. */
  trainings: { title: string; nextDueOn: string | null }[];
}
export interface FitnessInput {
  /** The shop's calendar date now, and of the session's start (the same when it starts today). */
  today: string;
  sessionDay: string;
  dueSoonDays: number;
  booth: BoothUpkeepFacts;
  /** null: nobody assigned yet; 'hidden': the viewer may not see the sprayer's records. */
  sprayer: SprayerFacts | null | 'hidden';
  /** The respiratory protection worn (at the checks) or needed (before them). */
  respirator: RespiratorLevel;
  isocyanate: boolean;
}

const rules = {
  filter: 'Change filters at the pressure drop the booth or filter maker gives (their instructions).',
  extraction: 'Local exhaust ventilation needs a thorough examination and test at least every 14 months in the UK (HSE HSG258); the shop sets its own interval.',
  extractionMinimum: 'The mean face velocity must reach the booth’s minimum (its maker’s figure or the shop’s setting).',
  fire: 'Fire protection inspected on the shop’s interval: common practice, no published source; follow the fire authority and the equipment maker.',
  fitTest: 'A tight-fitting facepiece must be fit-tested to its wearer (UK HSE and US OSHA 1910.134, from memory); the repeat interval is common practice, no published source.',
  surveillance: 'Only people under health surveillance should spray isocyanate products (HSE COSHH essentials MR2, HSG276).',
  training: 'Training renewed by the date it was given with: the shop’s own rule.',
} as const;

type Finding = Omit<FitnessFinding, 'subject'>;
const stop = (code: string, message: string, rule: string): Finding => ({ code, severity: 'stop', message, rule });
const caution = (code: string, message: string, rule: string): Finding => ({ code, severity: 'caution', message, rule });

/** Lapsed now is a stop; lapsing before the session's day or due soon is a caution. */
function dueFinding(input: FitnessInput, record: DatedRecord, code: string, what: string, rule: string, whenLapsed: FitnessSeverity): Finding | null {
  const now = dueStatus(record.nextDueOn, input.today, input.dueSoonDays);
  if (now === 'lapsed') return { code: `${code}-lapsed`, severity: whenLapsed, message: `${what} has lapsed.`, rule };
  if (dueStatus(record.nextDueOn, input.sessionDay, 0) === 'lapsed') return caution(`${code}-lapses-first`, `${what} lapses before this session’s day.`, rule);
  return now === 'due-soon' ? caution(`${code}-due-soon`, `${what} is due soon.`, rule) : null;
}

function filterFindings(booth: BoothUpkeepFacts): Finding[] {
  return booth.banks.flatMap((bank) => {
    const reads = bank.currentPa === null ? '' : `reads ${Math.round(bank.currentPa)} Pa against its change-at ${bank.changeAtPa} Pa`;
    if (bank.status === 'over-limit') return [stop('filter-over-limit', `Filter bank “${bank.name}” ${reads}: change the filters before spraying.`, rules.filter)];
    if (bank.status === 'near-limit') return [caution('filter-near-limit', `Filter bank “${bank.name}” ${reads}: plan the change.`, rules.filter)];
    if (bank.status === 'no-reading') return [caution('filter-no-reading', `Filter bank “${bank.name}” has no gauge reading since its filters were last changed: read the gauge.`, rules.filter)];
    return [];
  });
}

function boothFindings(input: FitnessInput): Finding[] {
  const { extractionTest, fireInspection } = input.booth;
  const found = filterFindings(input.booth);
  if (!extractionTest) found.push(caution('extraction-none', 'No extraction test is recorded for this booth.', rules.extraction));
  else {
    if (extractionTest.meanFaceVelocityMps < extractionTest.minFaceVelocityMps) {
      found.push(stop('extraction-below-minimum', `The last extraction test measured a mean face velocity of ${extractionTest.meanFaceVelocityMps.toFixed(2)} m/s, below the booth’s minimum of ${extractionTest.minFaceVelocityMps.toFixed(2)} m/s.`, rules.extractionMinimum));
    }
    const due = dueFinding(input, extractionTest, 'extraction', 'The extraction test', rules.extraction, 'stop');
    if (due) found.push(due);
  }
  if (!fireInspection) found.push(caution('fire-none', 'No fire-protection inspection is recorded for this booth.', rules.fire));
  else if (!fireInspection.passed) found.push(stop('fire-failed', 'The last fire-protection inspection found faults: have them put right and inspected again.', rules.fire));
  else {
    const due = dueFinding(input, fireInspection, 'fire', 'The fire-protection inspection', rules.fire, 'stop');
    if (due) found.push(due);
  }
  return found;
}

/** Air-fed protection is usually a loose hood or visor, which needs no fit test; a tight-fitting air-fed mask does. */
function fitTestFindings(input: FitnessInput, sprayer: SprayerFacts): Finding[] {
  const tight = input.respirator !== 'air-fed';
  const airFedNote = ' With air-fed protection this applies only to a tight-fitting facepiece, if one is worn.';
  const record = sprayer.fitTest;
  if (!record || !record.passed) {
    const message = record ? 'The sprayer’s latest face-fit test was not a pass.' : 'No face-fit test is recorded for the sprayer.';
    return [tight ? stop(record ? 'fit-test-failed' : 'fit-test-none', message, rules.fitTest) : caution(record ? 'fit-test-failed' : 'fit-test-none', message + airFedNote, rules.fitTest)];
  }
  const due = dueFinding(input, record, 'fit-test', 'The sprayer’s face-fit test', rules.fitTest, tight ? 'stop' : 'caution');
  if (!due) return [];
  return [tight ? due : { ...due, message: due.message + airFedNote }];
}

function sprayerFindings(input: FitnessInput, sprayer: SprayerFacts): Finding[] {
  const found = fitTestFindings(input, sprayer);
  if (input.isocyanate) {
    if (!sprayer.surveillance) found.push(stop('surveillance-none', 'No health surveillance for isocyanate work is recorded for the sprayer.', rules.surveillance));
    else {
      const due = dueFinding(input, sprayer.surveillance, 'surveillance', 'The sprayer’s health surveillance for isocyanate work', rules.surveillance, 'stop');
      if (due) found.push(due);
    }
  }
  for (const training of sprayer.trainings) {
    const due = dueFinding(input, { nextDueOn: training.nextDueOn, passed: true }, 'training', `The sprayer’s training “${training.title}”`, rules.training, 'caution');
    if (due) found.push(due);
  }
  return found;
}

export function assessFitness(input: FitnessInput): FitnessAssessment {
  const findings: FitnessFinding[] = boothFindings(input).map((f) => ({ ...f, subject: 'booth' as const }));
  if (input.sprayer === null) findings.push({ ...caution('sprayer-none', 'No sprayer is assigned yet, so their fit test and health surveillance cannot be checked.', rules.fitTest), subject: 'sprayer' });
  else if (input.sprayer !== 'hidden') findings.push(...sprayerFindings(input, input.sprayer).map((f) => ({ ...f, subject: 'sprayer' as const })));
  const verdict = findings.some((f) => f.severity === 'stop') ? 'stop' : findings.length ? 'caution' : 'go';
  return { verdict, findings };
}

/** The crew status a lead may see: the status of the latest record, and a failed fit test counts as lapsed. */
export function recordStatus(record: DatedRecord | null, today: string, dueSoonDays: number): DueStatus {
  if (!record) return 'none';
  if (!record.passed) return 'lapsed';
  if (record.nextDueOn === null) return 'valid';
  return dueStatus(record.nextDueOn, today, dueSoonDays);
}
