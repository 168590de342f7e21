import { In } from 'typeorm';
import { groupBy } from '../../shared/group-by';
import type { Coat } from '../../shared/schemas/coat';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';

export type CoatPlace = Pick<Coat, 'jobId' | 'jobReference' | 'coatNumber' | 'coatsTotal' | 'partLabels'>;

/** n of "coat n of m": how many coat steps lead up to and include the step at this position; null when that step is not a coat. */
function coatNumberAt(kinds: string[], position: number | null): number | null {
  if (position === null || kinds[position] !== 'coat') return null;
  return kinds.slice(0, position + 1).filter((kind) => kind === 'coat').length;
}

function partIdsByCoat(links: { coatId: number; partId: number }[]): Map<number, number[]> {
  const byCoat = groupBy(links, (link) => link.coatId, (link) => link.partId);
  for (const ids of byCoat.values()) ids.sort((a, b) => a - b);
  return byCoat;
}

/**
 * Where each coat of a page stands: its parts' labels, its job (its first part's) and which coat
 * of the job's finish system it was. Three queries for the whole page, whatever its size. Parts
 * are read across sites: a coat stays named by its parts and job after they move to another site's rack.
 */
export async function coatPlacesOf(data: SiteData, coats: CoatEntity[], links: { coatId: number; partId: number }[]): Promise<Map<number, CoatPlace>> {
  const partsOfCoat = partIdsByCoat(links);
  const partIds = [...new Set(links.map((l) => l.partId))];
  const parts = partIds.length ? await data.acrossSites.parts.find({ where: { id: In(partIds) }, select: { id: true, jobId: true, label: true } }) : [];
  const jobIds = [...new Set(parts.map((p) => p.jobId))];
  const jobs = jobIds.length ? await data.jobs.find({ where: { id: In(jobIds) }, select: { id: true, reference: true, finishSystemId: true } }) : [];
  const systemIds = [...new Set(jobs.flatMap((j) => (j.finishSystemId === null ? [] : [j.finishSystemId])))];
  const steps = systemIds.length ? await data.finishSteps.find({ where: { finishSystemId: In(systemIds) }, select: { finishSystemId: true, position: true, kind: true }, order: { position: 'ASC' } }) : [];
  const partById = new Map(parts.map((p) => [p.id, p]));
  const jobById = new Map(jobs.map((j) => [j.id, j]));
  const kindsOf = new Map(systemIds.map((id) => [id, steps.filter((s) => s.finishSystemId === id).map((s) => s.kind as string)]));
  return new Map(
    coats.map((coat): [number, CoatPlace] => {
      const ids = partsOfCoat.get(coat.id) ?? [];
      const partLabels = ids.map((id) => partById.get(id)?.label ?? '');
      const job = jobById.get(partById.get(ids[0])?.jobId ?? -1);
      if (!job) return [coat.id, { jobId: null, jobReference: null, coatNumber: null, coatsTotal: null, partLabels }];
      const kinds = job.finishSystemId === null ? null : (kindsOf.get(job.finishSystemId) ?? []);
      return [coat.id, { jobId: job.id, jobReference: job.reference, partLabels, coatNumber: kinds ? coatNumberAt(kinds, coat.stepPosition) : null, coatsTotal: kinds ? kinds.filter((kind) => kind === 'coat').length : null }];
    }),
  );
}
