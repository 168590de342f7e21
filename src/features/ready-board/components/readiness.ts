import { recoatWindowClosed, type ReadinessState } from '../../../../shared/finishing/readiness';
import { boardOrder, stateAt, type StateCounts } from '../../../../shared/finishing/wall-summary';
import type { ReadyPart } from '../../../../shared/schemas/ready';

export { boardOrder, compareForBoard, countStates, stateAt, type StateCounts } from '../../../../shared/finishing/wall-summary';

export const stateLabels: Record<ReadinessState, string> = {
  waiting: 'Waiting for finish',
  'in-finish': 'In finish',
  drying: 'Drying',
  'ready-to-handle': 'Ready to handle',
  'ready-to-pack': 'Ready to pack',
  cured: 'Fully cured',
  collected: 'Collected',
};

export const pickUpStates: ReadonlySet<ReadinessState> = new Set(['ready-to-handle', 'ready-to-pack', 'cured']);

/** A part as shown at a moment: the server's answer moved on by the instants passed since. */
export interface BoardPart extends ReadyPart {
  shownState: ReadinessState;
  /** The recoat window closed since the server answered: the next coat needs a denib first. */
  windowMissed: boolean;
}

const instant = (iso: string | null) => (iso === null ? null : new Date(iso));

export function toBoardPart(part: ReadyPart, now: Date): BoardPart {
  const windowMissed = part.state === 'in-finish' && recoatWindowClosed(instant(part.nextWindowClosesAt), now);
  return { ...part, shownState: stateAt(part, now), windowMissed };
}

/** "3 ready to handle, 2 drying" in the board's order; states with no parts are left out. */
export function countWords(counts: StateCounts, skip: readonly ReadinessState[] = []): string[] {
  return boardOrder
    .filter((state) => (counts[state] ?? 0) > 0 && !skip.includes(state))
    .map((state) => `${counts[state]} ${stateLabels[state].toLowerCase()}`);
}

/** Every instant still ahead at which some part's words or state change. */
export function upcomingInstants(parts: readonly ReadyPart[]): string[] {
  return parts.flatMap((p) => [p.handleAt, p.packAt, p.fullCureAt, p.nextWindowOpensAt, p.nextWindowClosesAt]).filter((at): at is string => at !== null);
}
