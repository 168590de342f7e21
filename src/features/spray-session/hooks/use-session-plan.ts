import { maxPartIds, type Part } from '../../../../shared/schemas/part';
import type { Product } from '../../../../shared/schemas/product';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useParts } from '../../../api/parts/get-parts';
import { plannedProducts, plannedSteps } from '../utils/session-plan';
import { useFinishWork } from './use-finish-work';

export type SessionPlan = ReturnType<typeof useFinishWork> & {
  parts: Part[];
  steps: Map<number, number | null>;
  products: Map<number, Product>;
  sprayed: Product[];
  /** What could not be worked out, in words, so a gap is never mistaken for "nothing to worry about". */
  gaps: string[];
};

const noParts: Part[] = [];

export function useSessionPlan(session: SpraySession): SessionPlan {
  const partIds = [...new Set(session.items.map((item) => item.partId))];
  const planned = useParts(partIds);
  const parts = planned.data ?? noParts;
  const work = useFinishWork(parts.map((part) => part.jobId));
  const steps = plannedSteps(session, parts, work);
  const sprayed = plannedProducts(parts, steps, work);
  const pending = (partIds.length > 0 && planned.isPending) || work.pending;
  const gaps: string[] = [];
  if (partIds.length === 0) gaps.push('No parts are planned for this session, so its products are not known.');
  if (partIds.length > maxPartIds)
    gaps.push(
      `Only the first ${maxPartIds} of ${partIds.length} planned parts were read; check the products of the rest.`,
    );
  if (planned.isError || work.error) gaps.push('Some of the planned parts or their data sheets could not be read.');
  const withoutSystem = parts.filter((part) => !pending && !work.systemByJob.has(part.jobId));
  if (withoutSystem.length) gaps.push(`${withoutSystem.length} planned part(s) belong to a job with no finish system.`);
  return { ...work, parts, steps, sprayed, pending, error: planned.error ?? work.error, gaps };
}
