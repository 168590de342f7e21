import { readinessStates, type ReadinessState } from '../../../../shared/finishing/readiness';
import type { Part } from '../../../../shared/schemas/part';
import { formatNumber } from '../../../lib/units-display';

const stateLabels: Record<ReadinessState, string> = {
  waiting: 'Waiting for finish',
  'in-finish': 'In finish',
  drying: 'Drying',
  'ready-to-handle': 'Ready to handle',
  'ready-to-pack': 'Ready to pack',
  cured: 'Cured',
  collected: 'Collected',
};

const isReadinessState = (state: string): state is ReadinessState => (readinessStates as readonly string[]).includes(state);

export function partStateLabel(state: string): string {
  return isReadinessState(state) ? stateLabels[state] : state;
}

/** "715 × 496 × 18 mm"; tables that name the unit in their header leave it off. */
export function partSize(part: Pick<Part, 'lengthMm' | 'widthMm' | 'thicknessMm'>, withUnit = true): string {
  const size = `${formatNumber(part.lengthMm)} × ${formatNumber(part.widthMm)} × ${formatNumber(part.thicknessMm)}`;
  return withUnit ? `${size} mm` : size;
}

export function facesWords(part: Pick<Part, 'faces' | 'edges'>): string {
  const faces = part.faces === 'both' ? 'Both faces' : 'One face';
  return part.edges ? `${faces}, all edges` : `${faces}, no edges`;
}

export function rackPlace(part: Pick<Part, 'rackId' | 'rackName' | 'shelf'>): string {
  if (part.rackId === null) return 'Not on a rack';
  const rack = part.rackName ?? `Rack ${part.rackId}`;
  return part.shelf === null ? `${rack}, any shelf` : `${rack}, shelf ${part.shelf}`;
}

/** The tag as printed: two groups of four read and type more easily than eight in a row. */
export function spacedTag(tag: string): string {
  return tag.length === 8 ? `${tag.slice(0, 4)} ${tag.slice(4)}` : tag;
}

export function partTotals(parts: Pick<Part, 'quantity' | 'coatedAreaM2'>[]) {
  return {
    lines: parts.length,
    pieces: parts.reduce((sum, part) => sum + part.quantity, 0),
    areaM2: parts.reduce((sum, part) => sum + part.coatedAreaM2, 0),
  };
}

export const areaRuleWords = 'A face is length × width. Edges means all four edges: the perimeter, 2 × (length + width), times the thickness.';
