import { In } from 'typeorm';
import type { FinishStep, PartCoat, ReadinessInput } from '../../shared/finishing/readiness';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { PartEntity } from '../db/entities/part.entity';

/**
 * Current coat versions (not yet corrected) that covered any of the parts, by part id, as the
 * data's scope sees them. A part's next step and readiness come from its whole history: pass
 * `data.acrossSites` for those.
 */
export async function currentCoatsByPart(data: SiteData, partIds: number[]): Promise<Map<number, CoatEntity[]>> {
  const byPart = new Map<number, CoatEntity[]>(partIds.map((id) => [id, []]));
  if (partIds.length === 0) return byPart;
  const links = await data.coatParts.find({ where: { partId: In(partIds) } });
  const coatIds = [...new Set(links.map((l) => l.coatId))];
  if (coatIds.length === 0) return byPart;
  const coats = await data.coats
    .select('c')
    .leftJoin('coats', 'n', 'n.replaces_id = c.id')
    .where('c.id IN (:...coatIds)', { coatIds })
    .andWhere('n.id IS NULL')
    .getMany();
  const byId = new Map(coats.map((c) => [c.id, c]));
  for (const link of links) {
    const coat = byId.get(link.coatId);
    if (coat) byPart.get(link.partId)?.push(coat);
  }
  return byPart;
}

/**
 * When each part was denibbed or scuffed, from the denib records the data's scope sees, by part id
 * (oldest first). For a part's readiness pass `data.acrossSites`, as for its coats.
 */
export async function denibTimesByPart(data: SiteData, partIds: number[]): Promise<Map<number, Date[]>> {
  const byPart = new Map<number, Date[]>(partIds.map((id) => [id, []]));
  if (partIds.length === 0) return byPart;
  const rows = await data.denibParts
    .select('dp')
    .innerJoin('denibs', 'd', 'd.id = dp.denib_id')
    .select('dp.part_id', 'partId')
    .addSelect('d.abraded_at', 'abradedAt')
    .where('dp.part_id IN (:...partIds)', { partIds })
    .orderBy('d.abraded_at', 'ASC')
    .getRawMany<{ partId: number | string; abradedAt: string }>();
  for (const row of rows) byPart.get(Number(row.partId))?.push(new Date(row.abradedAt));
  return byPart;
}

/** Each job's finish-system steps, in order, for the parts given. */
export async function stepsByJob(data: SiteData, parts: Pick<PartEntity, 'jobId'>[]): Promise<Map<number, FinishStep[]>> {
  const jobIds = [...new Set(parts.map((p) => p.jobId))];
  const jobs = jobIds.length ? await data.jobs.findBy({ id: In(jobIds) }) : [];
  const systemIds = [...new Set(jobs.map((j) => j.finishSystemId).filter((id): id is number => id !== null))];
  const steps = systemIds.length ? await data.finishSteps.find({ where: { finishSystemId: In(systemIds) }, order: { position: 'ASC' } }) : [];
  return new Map(
    jobs.map((job) => [
      job.id,
      steps
        .filter((s) => s.finishSystemId === job.finishSystemId)
        .map((s): FinishStep => (s.kind === 'coat' ? { kind: 'coat', productId: s.productId!, dryFilmUm: s.dryFilmUm! } : { kind: 'abrade', grit: s.grit ?? 'P320' })),
    ]),
  );
}

/** Coats as the readiness maths reads them; coats logged outside the finish system are left out. */
function coatInstants(c: CoatEntity): Omit<PartCoat, 'stepIndex'> {
  return {
    sprayedAt: new Date(c.sprayedAt),
    flashOffEndsAt: new Date(c.flashOffEndsAt),
    recoatOpensAt: new Date(c.recoatOpensAt),
    recoatClosesAt: c.recoatClosesAt ? new Date(c.recoatClosesAt) : null,
    touchDryAt: new Date(c.touchDryAt),
    handleAt: new Date(c.handleAt),
    packAt: new Date(c.packAt),
    fullCureAt: new Date(c.fullCureAt),
  };
}

export function toPartCoats(coats: CoatEntity[], steps: FinishStep[]): PartCoat[] {
  return coats
    .filter((c) => c.stepPosition !== null && steps[c.stepPosition]?.kind === 'coat')
    .map((c) => ({ stepIndex: c.stepPosition!, ...coatInstants(c) }));
}

/** Coats that match no coat step of the system: a part with no finish system is dried from these. */
export function unplannedPartCoats(coats: CoatEntity[], steps: FinishStep[]): NonNullable<ReadinessInput['unplannedCoats']> {
  return coats
    .filter((c) => c.stepPosition === null || steps[c.stepPosition]?.kind !== 'coat')
    .map(coatInstants);
}

/** The first coat step of the system not yet done on the part, or null when all are done. */
export function nextCoatStep(steps: FinishStep[], coats: CoatEntity[]): number | null {
  const done = new Set(coats.map((c) => c.stepPosition));
  const index = steps.findIndex((step, i) => step.kind === 'coat' && !done.has(i));
  return index === -1 ? null : index;
}
