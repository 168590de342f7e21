import type { PartHistory, PartHistoryEntry } from '../../shared/schemas/part-history';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import { notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { toCoatDtos } from './coat-dto';
import { loadFinishSystems } from './finish-systems';
import { readyPartsOf } from './ready';
import type { SettingsService } from './settings';

/** The part's current coat versions (not yet corrected) that `data`'s scope sees, as whole records. */
async function currentCoatsOf(data: SiteData, partId: number): Promise<CoatEntity[]> {
  const links = await data.coatParts.find({ where: { partId } });
  if (links.length === 0) return [];
  return data.coats
    .select('c')
    .leftJoin('coats', 'n', 'n.replaces_id = c.id')
    .where('c.id IN (:...coatIds)', { coatIds: links.map((l) => l.coatId) })
    .andWhere('n.id IS NULL')
    .getMany();
}

/** Coats that re-sprayed a step the part already had, counted over its whole history. */
function reworkIds(coats: CoatEntity[]): Set<number> {
  const seen = new Set<number | null>();
  const rework = new Set<number>();
  for (const coat of [...coats].sort((a, b) => a.sprayedAt.localeCompare(b.sprayedAt) || a.id - b.id)) {
    if (coat.reworkReason !== null || (coat.stepPosition !== null && seen.has(coat.stepPosition))) rework.add(coat.id);
    seen.add(coat.stepPosition);
  }
  return rework;
}

/**
 * The coats a part had, as every role may read them: what, when, who and the times, not the booth's
 * conditions. Only the scope's coats are listed (the coat log is each site's); whether one was a
 * re-spray is judged from the part's whole history.
 */
async function coatEntries(data: SiteData, partId: number): Promise<PartHistoryEntry[]> {
  const everyCoat = await currentCoatsOf(data.acrossSites, partId);
  const coats = await currentCoatsOf(data, partId);
  const rework = reworkIds(everyCoat);
  const dtos = await toCoatDtos(data, coats);
  return dtos.map((coat) => ({
    kind: 'coat' as const,
    id: coat.id,
    at: coat.sprayedAt,
    spraySessionId: coat.spraySessionId,
    stepPosition: coat.stepPosition,
    productName: coat.productName,
    dryFilmUm: coat.dryFilmUm,
    recordedByName: coat.recordedByName,
    recoatOpensAt: coat.recoatOpensAt,
    recoatClosesAt: coat.recoatClosesAt,
    handleAt: coat.handleAt,
    packAt: coat.packAt,
    rework: rework.has(coat.id),
    version: coat.version,
  }));
}

/** The scope's denibs of the part (denibs belong to their spray session's site, like coats). */
async function denibEntries(data: SiteData, partId: number): Promise<PartHistoryEntry[]> {
  const rows = await data.denibs
    .select('d')
    .where('d.id IN (SELECT dp.denib_id FROM denib_parts dp WHERE dp.part_id = :partId)', { partId })
    .orderBy('d.abraded_at', 'ASC')
    .getMany();
  return rows.map((d) => ({ kind: 'denib' as const, id: d.id, at: d.abradedAt, spraySessionId: d.spraySessionId, grit: d.grit, notes: d.notes, recordedByName: d.recordedByName }));
}

/**
 * A part is the group's, so any site may open its rack tag's page; where it stands and the coats and
 * denibs listed follow the site rules (a place on another site's rack is left out, and only the
 * caller's site's records are listed). Its next step and times come from its whole history.
 */
export function createPartHistoryService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  return {
    /** What a rack tag opens: where the part stands, its next step and times, and every coat and denib it had. */
    async get(partId: number): Promise<PartHistory> {
      const part = await data.parts.findOneBy({ id: partId });
      if (!part) throw notFound('Part');
      const now = clock.now();
      const { planningDryingTempC } = await settings.get();
      const job = await data.jobs.findOneBy({ id: part.jobId });
      const system = job?.finishSystemId ? await data.finishSystems.findOneBy({ id: job.finishSystemId }) : null;
      const [readiness] = await readyPartsOf(data, [part], planningDryingTempC, now);
      const coats = await coatEntries(data, partId);
      const denibs = await denibEntries(data, partId);
      const systems = system ? await loadFinishSystems(data, [system]) : [];
      const entries = [...coats, ...denibs].sort((a, b) => a.at.localeCompare(b.at));
      return { partId, readiness, steps: systems[0]?.steps ?? [], entries, dryingTempC: planningDryingTempC };
    },
  };
}

export type PartHistoryService = ReturnType<typeof createPartHistoryService>;
