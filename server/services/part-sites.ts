import { In } from 'typeorm';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import { currentCoatStepsByPart } from './part-coats';

type PlacedPart = Pick<PartEntity, 'id' | 'rackId'>;

/**
 * The parts the scope may see in detail. Parts belong to the group's jobs, but where a part is
 * belongs to a site: on a rack, the rack's site; off the racks, the site of its latest coat; a part
 * never coated and on no rack is still the whole group's.
 */
export async function partsSeenBy(data: SiteData, parts: PlacedPart[]): Promise<Set<number>> {
  if (data.scope.siteId === null) return new Set(parts.map((p) => p.id));
  const rackIds = [...new Set(parts.map((p) => p.rackId).filter((id): id is number => id !== null))];
  const racks = new Set(rackIds.length ? (await data.racks.find({ where: { id: In(rackIds) }, select: { id: true } })).map((r) => r.id) : []);
  const unplaced = parts.filter((p) => p.rackId === null).map((p) => p.id);
  const latestSpraySession = await latestSpraySessionOf(data, unplaced);
  const sessionIds = [...new Set(latestSpraySession.values())];
  const sessions = new Set(sessionIds.length ? (await data.spraySessions.find({ where: { id: In(sessionIds) }, select: { id: true } })).map((s) => s.id) : []);
  const seen = (p: PlacedPart) => (p.rackId !== null ? racks.has(p.rackId) : !latestSpraySession.has(p.id) || sessions.has(latestSpraySession.get(p.id)!));
  return new Set(parts.filter(seen).map((p) => p.id));
}

/** The spray session of each part's latest current coat, for parts that have one. */
async function latestSpraySessionOf(data: SiteData, partIds: number[]): Promise<Map<number, number>> {
  const coats = await currentCoatStepsByPart(data.acrossSites, partIds);
  const latest = new Map<number, number>();
  for (const [partId, list] of coats) {
    const last = [...list].sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt) || b.id - a.id)[0];
    if (last) latest.set(partId, last.spraySessionId);
  }
  return latest;
}

/** Whether one part is the scope's to change: see `partsSeenBy`. */
export async function partSeenBy(data: SiteData, part: PlacedPart): Promise<boolean> {
  return (await partsSeenBy(data, [part])).has(part.id);
}
