import { evaluateChecklist } from '../../shared/finishing/checklist';
import type { Checklist, ChecklistResult } from '../../shared/schemas/checklist';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { SpraySessionState } from '../../shared/schemas/spray-session';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SiteData } from '../data/site-data';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { AppError } from '../lib/app-error';
import type { Actor } from './audit';
import { fitnessOf } from './fitness';
import { spraySessionProducts } from './spray-session-products';

export interface SpraySessionActor extends Actor {
  /** A lead or admin: may book, rebook and start spraying over a stop. Anyone else only runs their own sessions. */
  mayOverride: boolean;
}

/** The checks, with the booth's upkeep and the assigned sprayer's records judged for the protection actually worn. */
export async function recordChecklist(tx: SiteData, spraySession: SpraySessionEntity, booth: BoothEntity, checklist: Checklist, actor: SpraySessionActor, shop: ShopSettings, now: Date): Promise<ChecklistResult> {
  if (checklist.overrideReason && !actor.mayOverride) {
    throw new AppError('forbidden', 'Only a finishing lead can override a stop; ask them to enter the reason', { overrideReason: 'A lead must give this' });
  }
  const products = await spraySessionProducts(tx, spraySession.id);
  const fitness = (await fitnessOf(tx, spraySession, booth, products, shop, now, true))(checklist.respiratorKind);
  const { verdict, problems, notes } = evaluateChecklist(checklist, booth, products, fitness.findings);
  return { ...checklist, verdict, problems, notes, completedAt: now.toISOString(), completedByName: actor.name };
}

/** Spraying starts only from a completed checklist; a stop needs a lead's recorded reason. */
export function changeState(spraySession: SpraySessionEntity, next: SpraySessionState, now: string): void {
  if (next === 'spraying' && spraySession.state !== 'spraying') {
    const checklist = spraySession.checklist;
    if (!checklist) throw new AppError('conflict', 'Complete the pre-spray checklist before spraying', { checklist: 'Not done yet' });
    if (checklist.verdict === 'stop' && !checklist.overrideReason) {
      throw new AppError('conflict', `The checklist says stop: ${checklist.problems.join(' ')} A lead may override with a reason.`, { checklist: 'Stop' });
    }
  }
  if (next === 'spraying' && !spraySession.sprayingStartedAt) spraySession.sprayingStartedAt = now;
  if (next === 'clearing') spraySession.clearingStartedAt = now;
  spraySession.state = next;
}
