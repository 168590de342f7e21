import { In, Not, type EntityManager } from 'typeorm';
import type { PartBooking } from '../../shared/finishing/job-ready-time';
import { partReadiness, type FinishStep, type PartReadiness, type ReadinessInput } from '../../shared/finishing/readiness';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { PartEntity } from '../db/entities/part.entity';
import { SpraySessionItemEntity } from '../db/entities/spray-session-item.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { currentCoatsByPart, denibTimesByPart, stepsByJob, toPartCoats } from './part-coats';

export interface PartFacts {
  steps: FinishStep[];
  coats: CoatEntity[];
  input: ReadinessInput;
}

/** What the readiness maths needs for each part: its finish system, current coats, denibs and collection. */
export async function partFactsOf(manager: EntityManager, parts: PartEntity[], now: Date): Promise<Map<number, PartFacts>> {
  const ids = parts.map((p) => p.id);
  // One after another: inside a transaction on PostgreSQL the manager has a single connection.
  const coats = await currentCoatsByPart(manager, ids);
  const denibs = await denibTimesByPart(manager, ids);
  const steps = await stepsByJob(manager, parts);
  return new Map(
    parts.map((part) => {
      const system = steps.get(part.jobId) ?? [];
      const partCoats = coats.get(part.id) ?? [];
      const collectedAt = part.collectedAt ? new Date(part.collectedAt) : null;
      const input = { steps: system, coats: toPartCoats(partCoats, system), abradedAt: denibs.get(part.id) ?? [], collectedAt, now };
      return [part.id, { steps: system, coats: partCoats, input }];
    }),
  );
}

/** Readiness of each part at `now`, from its current coats, its denibs and its job's finish system. */
export async function readinessOf(manager: EntityManager, parts: PartEntity[], now: Date): Promise<Map<number, PartReadiness>> {
  const facts = await partFactsOf(manager, parts, now);
  return new Map([...facts].map(([id, fact]) => [id, partReadiness(fact.input)]));
}

/** Sessions still to run (or running) that plan each part, as the ready-time maths reads them. */
export async function bookingsByPart(manager: EntityManager, partIds: number[]): Promise<Map<number, PartBooking[]>> {
  const byPart = new Map<number, PartBooking[]>();
  if (partIds.length === 0) return byPart;
  const items = await manager.find(SpraySessionItemEntity, { where: { partId: In(partIds) } });
  const sessionIds = [...new Set(items.map((i) => i.spraySessionId))];
  const sessions = sessionIds.length ? await manager.find(SpraySessionEntity, { where: { id: In(sessionIds), state: Not(In(['done', 'cancelled', 'clearing'])) } }) : [];
  const startById = new Map(sessions.map((s) => [s.id, new Date(s.startAt)]));
  for (const item of items) {
    const startAt = startById.get(item.spraySessionId);
    if (startAt) byPart.set(item.partId, [...(byPart.get(item.partId) ?? []), { startAt, stepIndex: item.stepPosition }]);
  }
  return byPart;
}
