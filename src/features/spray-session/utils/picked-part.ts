import type { Part } from '../../../../shared/schemas/part';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { normaliseTag } from '../../../api/parts/normalise-tag';

/** What the coat form needs of a part, wherever it was picked from (the plan, a job, a rack or a tag). */
export interface PickedPart {
  id: number;
  label: string;
  jobId: number;
  rackId: number | null;
  /** Where it stands, in words, when known: "coat 1 of 3 done". */
  progress?: string;
}

export const fromPart = (part: Part): PickedPart => ({ id: part.id, label: part.label, jobId: part.jobId, rackId: part.rackId });

export const fromReady = (part: ReadyPart): PickedPart => ({
  id: part.id,
  label: part.label,
  jobId: part.jobId,
  rackId: part.rack?.id ?? null,
  progress: `${part.coatsDone} of ${part.coatsTotal} coats done`,
});

/** A scanned QR holds the part's page address (…/parts/123); a typed code is the tag printed under it. */
export function readScannedCode(raw: string): { partId: number } | { tag: string } | null {
  const text = raw.trim();
  const fromAddress = /\/parts\/(\d+)(?:[/?#]|$)/.exec(text);
  if (fromAddress) return { partId: Number(fromAddress[1]) };
  const tag = normaliseTag(text);
  return /^[A-Z0-9]{4,16}$/.test(tag) ? { tag } : null;
}
