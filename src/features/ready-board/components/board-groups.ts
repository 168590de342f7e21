import { boardOrder, compareForBoard, type BoardPart } from './readiness';

export type GroupBy = 'job' | 'rack';

export interface BoardGroup {
  key: string;
  title: string;
  subtitle: string;
  parts: BoardPart[];
}

const byName = new Intl.Collator('en-GB', { numeric: true });

function collect(parts: readonly BoardPart[], keyOf: (part: BoardPart) => string, make: (part: BoardPart) => Omit<BoardGroup, 'parts'>): BoardGroup[] {
  const groups = new Map<string, BoardGroup>();
  for (const part of parts) {
    const key = keyOf(part);
    const group = groups.get(key) ?? { ...make(part), parts: [] };
    group.parts.push(part);
    groups.set(key, group);
  }
  return [...groups.values()].map((group) => ({ ...group, parts: group.parts.sort(compareForBoard) }));
}

/** Parts are sorted within the group, so its first part is its most pressing. */
const urgency = (group: BoardGroup) => boardOrder.indexOf(group.parts[0].shownState);

/** Jobs with parts to pick up first, then those closest to it; by reference among equals. */
export function groupByJob(parts: readonly BoardPart[]): BoardGroup[] {
  return collect(
    parts,
    (part) => `job-${part.jobId}`,
    (part) => ({ key: `job-${part.jobId}`, title: part.jobReference, subtitle: part.customer }),
  ).sort((a, b) => urgency(a) - urgency(b) || byName.compare(a.title, b.title));
}

/** The rack a part is on, or for a collected part the rack it was taken from. */
const rackOf = (part: BoardPart) => part.rack ?? part.collectedFrom;

/** Racks by name; parts on no rack come last, as they are somewhere the board cannot say. */
export function groupByRack(parts: readonly BoardPart[]): BoardGroup[] {
  const groups = collect(
    parts,
    (part) => (rackOf(part) ? `rack-${rackOf(part)!.id}` : 'rack-none'),
    (part) => {
      const rack = rackOf(part);
      return rack ? { key: `rack-${rack.id}`, title: rack.name, subtitle: '' } : { key: 'rack-none', title: 'Not on a rack', subtitle: 'No rack or shelf recorded' };
    },
  );
  return groups.sort((a, b) => (a.key === 'rack-none' ? 1 : b.key === 'rack-none' ? -1 : byName.compare(a.title, b.title)));
}

/** Where to find a part, in the words the other grouping does not already give. */
export function placeWords(part: BoardPart, groupBy: GroupBy): string {
  if (part.collectedAt) return groupBy === 'rack' ? `${part.jobReference} · ${part.customer} · taken off the rack` : 'Taken off the rack';
  if (groupBy === 'rack') return `${part.jobReference} · ${part.customer}${part.rack?.shelf != null ? ` · shelf ${part.rack.shelf}` : ''}`;
  if (!part.rack) return 'Not on a rack';
  return part.rack.shelf != null ? `${part.rack.name}, shelf ${part.rack.shelf}` : part.rack.name;
}
