import { readinessMovedOn, recoatWindowClosed, type ReadinessState } from '../../../../shared/finishing/readiness';
import type { ReadyPart } from '../../../../shared/schemas/ready';

export const stateLabels: Record<ReadinessState, string> = {
  waiting: 'Waiting for finish',
  'in-finish': 'In finish',
  drying: 'Drying',
  'ready-to-handle': 'Ready to handle',
  'ready-to-pack': 'Ready to pack',
  cured: 'Fully cured',
  collected: 'Collected',
};

/** The order the board lists parts in: what can be picked up now first, then what will be soonest. */
export const boardOrder: readonly ReadinessState[] = ['ready-to-handle', 'ready-to-pack', 'cured', 'drying', 'in-finish', 'waiting', 'collected'];

export const pickUpStates: ReadonlySet<ReadinessState> = new Set(['ready-to-handle', 'ready-to-pack', 'cured']);

/** A part as shown at a moment: the server's answer moved on by the instants passed since. */
export interface BoardPart extends ReadyPart {
  shownState: ReadinessState;
  /** The recoat window closed since the server answered: the next coat needs a denib first. */
  windowMissed: boolean;
}

const instant = (iso: string | null) => (iso === null ? null : new Date(iso));

/** The server's answer moved on to `now` by the shared rule (a state begins at its instant; never behind the answer). */
export function stateAt(part: ReadyPart, now: Date): ReadinessState {
  return readinessMovedOn(part.state, { handleAt: instant(part.handleAt), packAt: instant(part.packAt), fullCureAt: instant(part.fullCureAt) }, now);
}

export function toBoardPart(part: ReadyPart, now: Date): BoardPart {
  const windowMissed = part.state === 'in-finish' && recoatWindowClosed(instant(part.nextWindowClosesAt), now);
  return { ...part, shownState: stateAt(part, now), windowMissed };
}

const byLabel = new Intl.Collator('en-GB', { numeric: true });

export function compareForBoard(a: BoardPart, b: BoardPart): number {
  const rank = boardOrder.indexOf(a.shownState) - boardOrder.indexOf(b.shownState);
  if (rank !== 0) return rank;
  if (a.shownState === 'drying') {
    const soonest = Date.parse(a.handleAt ?? '') - Date.parse(b.handleAt ?? '');
    if (soonest) return soonest;
  }
  return byLabel.compare(a.label, b.label);
}

export type StateCounts = Partial<Record<ReadinessState, number>>;

export function countStates(parts: readonly BoardPart[]): StateCounts {
  const counts: StateCounts = {};
  for (const part of parts) counts[part.shownState] = (counts[part.shownState] ?? 0) + 1;
  return counts;
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
