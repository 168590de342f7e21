import type { FinishStep } from '../../../../shared/schemas/finish-system';
import type { PartHistory, PartHistoryEntry } from '../../../../shared/schemas/part-history';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../../shared/units';
import { shopMoment, timeUntil } from '../../../lib/ready-time-words';
import { coatOfWords, denibWords } from '../../../../shared/words';

type Ready = PartHistory['readiness'];
const ahead = (iso: string | null, now: Date): iso is string => iso !== null && Date.parse(iso) > now.getTime();

function moment(what: string, iso: string, now: Date, timeZone: string, estimate = false): string {
  if (!ahead(iso, now)) return `${what} since ${shopMoment(iso, now, timeZone)}`;
  return `${what} ${estimate ? 'from about' : 'at'} ${shopMoment(iso, now, timeZone)} (in ${timeUntil(iso, now)})`;
}

function windowWords(r: Ready, now: Date, timeZone: string): string | null {
  if (ahead(r.nextWindowOpensAt, now)) return `Window for the next coat opens ${shopMoment(r.nextWindowOpensAt, now, timeZone)} (in ${timeUntil(r.nextWindowOpensAt, now)})`;
  if (r.nextWindowClosesAt && ahead(r.nextWindowClosesAt, now)) return `Window open until ${shopMoment(r.nextWindowClosesAt, now, timeZone)}`;
  if (r.nextWindowClosesAt) return 'The recoat window has closed: denib before the next coat';
  return r.nextWindowOpensAt ? 'Window open, no closing time' : null;
}

/** Where the part stands now, for anyone at its rack: what is next, and when it can be handled and packed. */
export function partNowLines(history: PartHistory, now: Date, timeZone: string, units: UnitSystem): { headline: string; details: string[] } {
  const r = history.readiness;
  if (r.coatsTotal === 0) return { headline: 'Its job has no finish system yet', details: [] };
  if (r.state === 'collected') return { headline: r.collectedAt ? `Collected ${shopMoment(r.collectedAt, now, timeZone)}` : 'Collected', details: [] };
  if (r.coatsRemaining === 0) {
    const lines = [r.expectedHandleAt && moment('Ready to handle', r.expectedHandleAt, now, timeZone), r.expectedPackAt && moment('Ready to pack', r.expectedPackAt, now, timeZone), r.fullCureAt && moment('Fully cured', r.fullCureAt, now, timeZone)];
    const [headline, ...details] = lines.filter((line): line is string => Boolean(line));
    return { headline: headline ?? 'Every coat is on', details };
  }
  const nextStep = history.steps.filter((step) => step.kind === 'coat')[r.coatsDone];
  const next = `${coatOfWords(r.coatsDone + 1, r.coatsTotal)}${nextStep?.kind === 'coat' ? ` (${nextStep.productName})` : ''}`;
  const grit = r.nextStepKind === 'denib' ? r.nextStepGrit : null;
  const headline = r.abradeRequired ? `Next: ${grit ? denibWords(grit) : 'denib'}, then ${next}` : `Next: ${next}`;
  const temp = formatQuantity(history.dryingTempC, 'temperature', units);
  const estimate = r.expectedHandleAt && r.expectedPackAt
    ? `${moment('Ready to handle', r.expectedHandleAt, now, timeZone, true)}; ready to pack from about ${shopMoment(r.expectedPackAt, now, timeZone)}. An estimate: ${r.coatsRemaining} ${r.coatsRemaining === 1 ? 'coat' : 'coats'} to go, each as soon as its window opens, drying at ${temp}.`
    : null;
  return { headline, details: [windowWords(r, now, timeZone), r.denibbedAt && `Denibbed ${shopMoment(r.denibbedAt, now, timeZone)}`, estimate].filter((line): line is string => Boolean(line)) };
}

export type StepStatus = { step: FinishStep; done: PartHistoryEntry | 'no-record' | null; next: boolean };

/** Each step of the finish system with the record that did it; a denib counts if done after the coat before it. */
export function stepStatuses(history: PartHistory): StepStatus[] {
  const coats = history.entries.filter((e) => e.kind === 'coat');
  const denibs = history.entries.filter((e) => e.kind === 'denib');
  const statuses = history.steps.map((step): StepStatus => {
    if (step.kind === 'coat') return { step, done: coats.filter((c) => c.stepPosition === step.position).at(-1) ?? null, next: false };
    const before = coats.filter((c) => c.stepPosition !== null && c.stepPosition < step.position).at(-1);
    const denib = denibs.find((d) => !before || d.at > before.at) ?? null;
    const laterCoat = coats.some((c) => c.stepPosition !== null && c.stepPosition > step.position);
    return { step, done: denib ?? (laterCoat ? 'no-record' : null), next: false };
  });
  const first = statuses.findIndex((s) => s.done === null);
  if (first >= 0 && history.readiness.state !== 'collected') statuses[first].next = true;
  return statuses;
}
