import type { SiteData } from '../data/site-data';
import { AppError } from '../lib/app-error';
import type { Actor } from './audit';

/** Who is writing a coat, pot or correction; a sprayer runs only the spray sessions assigned to them. */
export interface SpraySessionRunner extends Actor {
  ownSpraySessionsOnly?: boolean;
}

export async function assertRunsSpraySession(tx: SiteData, spraySessionId: number, runner: SpraySessionRunner): Promise<void> {
  if (!runner.ownSpraySessionsOnly) return;
  const spraySession = await tx.spraySessions.findOneBy({ id: spraySessionId });
  if (spraySession && spraySession.sprayerId !== runner.id) {
    throw new AppError('forbidden', 'This spray session is not assigned to you; ask the finishing lead to assign it to you before logging on it', { spraySessionId: 'Not your session' });
  }
}
