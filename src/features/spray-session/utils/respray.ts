import type { Coat } from '../../../../shared/schemas/coat';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { CoatStep } from './session-plan';

/**
 * Whether a chosen part already has this step: a live coat at the step in this session, or (coats
 * go on in order) a count of coats done that passes it. Then the coat is likely a re-spray.
 */
export function repeatsStep(partIds: number[], step: CoatStep | undefined, steps: CoatStep[], ready: Map<number, ReadyPart>, sessionCoats: Coat[]): boolean {
  if (!step) return false;
  const index = steps.findIndex((s) => s.position === step.position);
  const inSession = sessionCoats.some((coat) => coat.supersededById === null && coat.stepPosition === step.position && coat.partIds.some((id) => partIds.includes(id)));
  return inSession || partIds.some((id) => (ready.get(id)?.coatsDone ?? 0) > index);
}
