import type { SessionCoat, SessionWork } from '../../shared/schemas/spray-session';

const parts = (n: number) => `${n} part${n === 1 ? '' : 's'}`;

/** "LJ-26-105 · coat 1 of 3": which job and how far through its finish system. */
export function coatHeadline(coat: SessionCoat): string {
  return `${coat.jobReference} · coat ${coat.coatNumber} of ${coat.coatsTotal}`;
}

/** "Kestrel 2K PU Primer White · Ink blue": what goes on, in what colour. */
export function coatMaterial(coat: SessionCoat): string {
  return coat.colour ? `${coat.productName} · ${coat.colour}` : coat.productName;
}

/** "8 parts", or "8 parts, 3 sprayed" once coats are on record. */
export function partsWords(work: Pick<SessionWork, 'partCount' | 'sprayedCount'>): string {
  if (work.partCount === 0) return 'No parts planned yet';
  if (work.sprayedCount === 0) return parts(work.partCount);
  if (work.sprayedCount >= work.partCount) return `${parts(work.partCount)}, all sprayed`;
  return `${parts(work.partCount)}, ${work.sprayedCount} sprayed`;
}

/** One line for lists: every coat the session sprays, then its parts. */
export function sessionWorkLine(work: SessionWork): string {
  const coats = work.coats.map((c) => `${coatHeadline(c)}: ${coatMaterial(c)}`);
  const jobsWithoutSystem = work.jobs.filter((j) => !work.coats.some((c) => c.jobId === j.id)).map((j) => j.reference);
  return [...coats, ...jobsWithoutSystem, partsWords(work)].join(' · ');
}
