import type { DataSource } from 'typeorm';
import type { PartHistory, PartHistoryEntry } from '../../shared/schemas/part-history';
import { DenibEntity } from '../db/entities/denib.entity';
import { FinishSystemEntity } from '../db/entities/finish-system.entity';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { toCoatDtos } from './coat-dto';
import { loadFinishSystems } from './finish-systems';
import { currentCoatsByPart } from './part-coats';
import { readyPartsOf } from './ready';
import type { SettingsService } from './settings';

/** The coats a part had, as every role may read them: what, when, who and the times, not the booth's conditions. */
async function coatEntries(dataSource: DataSource, partId: number): Promise<PartHistoryEntry[]> {
  const coats = (await currentCoatsByPart(dataSource.manager, [partId])).get(partId) ?? [];
  const dtos = await toCoatDtos(dataSource.manager, coats);
  const seen = new Set<number | null>();
  return dtos
    .sort((a, b) => a.sprayedAt.localeCompare(b.sprayedAt) || a.id - b.id)
    .map((coat) => {
      const rework = coat.reworkReason !== null || (coat.stepPosition !== null && seen.has(coat.stepPosition));
      seen.add(coat.stepPosition);
      return {
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
        rework,
        version: coat.version,
      };
    });
}

async function denibEntries(dataSource: DataSource, partId: number): Promise<PartHistoryEntry[]> {
  const rows = await dataSource
    .getRepository(DenibEntity)
    .createQueryBuilder('d')
    .where('d.id IN (SELECT dp.denib_id FROM denib_parts dp WHERE dp.part_id = :partId)', { partId })
    .orderBy('d.abraded_at', 'ASC')
    .getMany();
  return rows.map((d) => ({ kind: 'denib' as const, id: d.id, at: d.abradedAt, spraySessionId: d.spraySessionId, grit: d.grit, notes: d.notes, recordedByName: d.recordedByName }));
}

export function createPartHistoryService(dataSource: DataSource, settings: SettingsService, clock: Clock = systemClock) {
  return {
    /** What a rack tag opens: where the part stands, its next step and times, and every coat and denib it had. */
    async get(partId: number): Promise<PartHistory> {
      const part = await dataSource.getRepository(PartEntity).findOneBy({ id: partId });
      if (!part) throw notFound('Part');
      const now = clock.now();
      const { planningDryingTempC } = await settings.get();
      const job = await dataSource.getRepository(JobEntity).findOneBy({ id: part.jobId });
      const system = job?.finishSystemId ? await dataSource.getRepository(FinishSystemEntity).findOneBy({ id: job.finishSystemId }) : null;
      const [[readiness], coats, denibs, systems] = await Promise.all([
        readyPartsOf(dataSource, [part], planningDryingTempC, now),
        coatEntries(dataSource, partId),
        denibEntries(dataSource, partId),
        system ? loadFinishSystems(dataSource.manager, [system]) : Promise.resolve([]),
      ]);
      const entries = [...coats, ...denibs].sort((a, b) => a.at.localeCompare(b.at));
      return { partId, readiness, steps: systems[0]?.steps ?? [], entries, dryingTempC: planningDryingTempC };
    },
  };
}

export type PartHistoryService = ReturnType<typeof createPartHistoryService>;
