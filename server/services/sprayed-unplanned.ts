import { In } from 'typeorm';
import type { SiteData } from '../data/site-data';

/** A part sprayed in a session without being on its plan: it still belongs to what the session did. */
export interface SprayedPart {
  spraySessionId: number;
  partId: number;
  stepPosition: number | null;
}

/** Parts with a current coat recorded in each session, read once for a whole list of sessions. */
export async function sprayedPartsOf(data: SiteData, sessionIds: number[]): Promise<SprayedPart[]> {
  if (sessionIds.length === 0) return [];
  const coats = await data.coats
    .select('c')
    .leftJoin('coats', 'n', 'n.replaces_id = c.id')
    .where('c.spray_session_id IN (:...sessionIds)', { sessionIds })
    .andWhere('n.id IS NULL')
    .getMany();
  if (coats.length === 0) return [];
  const byId = new Map(coats.map((c) => [c.id, c]));
  const links = await data.coatParts.find({ where: { coatId: In([...byId.keys()]) } });
  return links.map((link) => {
    const coat = byId.get(link.coatId)!;
    return { spraySessionId: coat.spraySessionId, partId: link.partId, stepPosition: coat.stepPosition };
  });
}

/** The sprayed parts that are not on their session's plan, once per part and step. */
export function unplannedOf(sprayed: SprayedPart[], planned: { spraySessionId: number; partId: number }[]): SprayedPart[] {
  const onPlan = new Set(planned.map((p) => `${p.spraySessionId}:${p.partId}`));
  const seen = new Set<string>();
  return sprayed.filter((s) => {
    const key = `${s.spraySessionId}:${s.partId}:${s.stepPosition}`;
    if (onPlan.has(`${s.spraySessionId}:${s.partId}`) || seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
