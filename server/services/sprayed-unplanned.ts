import { idListParam, type SiteData } from '../data/site-data';

/** A part sprayed in a session without being on its plan: it still belongs to what the session did. */
export interface SprayedPart {
  spraySessionId: number;
  partId: number;
  stepPosition: number | null;
}

// Only the coats whose part is not on its session's plan: a planned part's coats are read with its history.
const sprayedOffPlanSql = (idList: string) => `
  SELECT c.spray_session_id AS "spraySessionId", cp.part_id AS "partId", c.step_position AS "stepPosition"
  FROM coats c JOIN coat_parts cp ON cp.coat_id = c.id
  WHERE c.spray_session_id IN (${idList})
    AND NOT EXISTS (SELECT 1 FROM coats n WHERE n.replaces_id = c.id)
    AND NOT EXISTS (SELECT 1 FROM spray_session_items i WHERE i.part_id = cp.part_id AND i.spray_session_id = c.spray_session_id)`;

/**
 * Parts with a current coat recorded in each session without being on its plan, read once for a
 * whole list of sessions. The sessions are ones the caller read through its own scope, so their
 * coats are the scope's too.
 */
export async function sprayedOffPlanOf(data: SiteData, sessionIds: number[]): Promise<SprayedPart[]> {
  if (sessionIds.length === 0) return [];
  const { sql } = data;
  const rows = await sql.select<SprayedPart>(sprayedOffPlanSql(sql.idList), [idListParam(sql.dialect, sessionIds)]);
  return rows.map((r) => ({ spraySessionId: Number(r.spraySessionId), partId: Number(r.partId), stepPosition: r.stepPosition === null ? null : Number(r.stepPosition) }));
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
