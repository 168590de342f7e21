import type { EntityManager } from 'typeorm';
import { evaluateChecklist } from '../../shared/finishing/checklist';
import type { Checklist, ChecklistResult } from '../../shared/schemas/checklist';
import type { SpraySessionState } from '../../shared/schemas/spray-session';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { AppError } from '../lib/app-error';
import type { Actor } from './audit';
import { sessionProducts } from './session-products';

export interface SessionActor extends Actor {
  /** Only a lead or admin may start spraying over a stop. */
  mayOverride: boolean;
}

export async function recordChecklist(manager: EntityManager, session: SpraySessionEntity, booth: BoothEntity, checklist: Checklist, actor: SessionActor): Promise<ChecklistResult> {
  if (checklist.overrideReason && !actor.mayOverride) {
    throw new AppError('forbidden', 'Only a finishing lead can override a stop; ask them to enter the reason', { overrideReason: 'A lead must give this' });
  }
  const { verdict, problems } = evaluateChecklist(checklist, booth, await sessionProducts(manager, session.id));
  return { ...checklist, verdict, problems, completedAt: new Date().toISOString(), completedByName: actor.name };
}

/** Spraying starts only from a completed checklist; a stop needs a lead's recorded reason. */
export function changeState(session: SpraySessionEntity, next: SpraySessionState, now: string): void {
  if (next === 'spraying' && session.state !== 'spraying') {
    const checklist = session.checklist;
    if (!checklist) throw new AppError('conflict', 'Complete the pre-spray checklist before spraying', { checklist: 'Not done yet' });
    if (checklist.verdict === 'stop' && !checklist.overrideReason) {
      throw new AppError('conflict', `The checklist says stop: ${checklist.problems.join(' ')} A lead may override with a reason.`, { checklist: 'Stop' });
    }
  }
  if (next === 'spraying' && !session.sprayingStartedAt) session.sprayingStartedAt = now;
  if (next === 'clearing') session.clearingStartedAt = now;
  session.state = next;
}
