import type { JobState } from '../schemas/job';
import type { PartReadiness } from './readiness';

export type JobLifeCycle = {
  state: Extract<JobState, 'open' | 'in-finish' | 'ready' | 'delivered'>;
  /** Once every coat is on every part not yet collected: when the last of them can be handled. */
  readyAt: Date | null;
};

/**
 * Where a job stands, from its parts: open until a first coat lands; in finish while any part
 * still needs a coat or is not yet dry to handle; ready once every part not yet collected can be
 * handled (every coat of its finish system on); delivered once every part is collected.
 */
export function jobLifeCycle(parts: PartReadiness[], now: Date): JobLifeCycle {
  if (parts.length === 0) return { state: 'open', readyAt: null };
  const onRacks = parts.filter((part) => part.state !== 'collected');
  if (onRacks.length === 0) return { state: 'delivered', readyAt: null };
  if (parts.every((part) => part.coatsDone === 0)) return { state: 'open', readyAt: null };
  const allCoatsOn = onRacks.every((part) => part.coatsTotal > 0 && part.nextStep === null && part.handleAt !== null);
  if (!allCoatsOn) return { state: 'in-finish', readyAt: null };
  const readyAt = new Date(Math.max(...onRacks.map((part) => part.handleAt!.getTime())));
  return { state: readyAt.getTime() <= now.getTime() ? 'ready' : 'in-finish', readyAt };
}

/** The state to show at `now`: an in-finish job whose ready time has passed is ready, with no write needed. */
export function jobStateAt(stored: JobState, readyAt: string | null, now: Date): JobState {
  return stored === 'in-finish' && readyAt !== null && Date.parse(readyAt) <= now.getTime() ? 'ready' : stored;
}
