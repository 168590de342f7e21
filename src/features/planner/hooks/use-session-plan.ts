import { useQueries } from '@tanstack/react-query';
import type { CautionProduct } from '../../../../shared/finishing/cautions';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import type { Product } from '../../../../shared/schemas/product';
import { jobQueryOptions } from '../api/get-job';
import { partQueryOptions } from '../api/get-part';
import { usePlannerFinishSystems } from '../api/get-planner-finish-systems';
import { usePlannerProducts } from '../api/get-planner-products';
import type { PlannerSession } from '../api/get-spray-sessions';

/** Parts are looked up one by one (the session lists only ids), so a very large session is read in part. */
export const partLookupLimit = 60;

export interface PlannedPartRow {
  partId: number;
  label: string;
  jobReference: string | null;
  coat: string;
  /** When this step's coat went on the part; null while it is still to spray. */
  sprayedAt: string | null;
}

export interface SessionPlan {
  pending: boolean;
  rows: PlannedPartRow[];
  products: CautionProduct[];
  /** Why the products (and so the cautions) may be incomplete, in words. */
  gaps: string[];
}

const unique = <T,>(values: T[]) => [...new Set(values)];

function coatStep(system: FinishSystem | undefined, position: number | null) {
  const step = position === null ? undefined : system?.steps.find((s) => s.position === position);
  return step?.kind === 'coat' ? step : undefined;
}

/** The session's parts with their jobs and coats, and the products those coats use. */
export function useSessionPlan(session: PlannerSession, canReadProducts: boolean): SessionPlan {
  const partIds = unique(session.items.map((item) => item.partId));
  const parts = useQueries({ queries: partIds.slice(0, partLookupLimit).map((id) => partQueryOptions(id)) });
  const jobIds = unique(parts.flatMap((q) => (q.data ? [q.data.jobId] : [])));
  const jobs = useQueries({ queries: jobIds.map((id) => jobQueryOptions(id)) });
  const systems = usePlannerFinishSystems(partIds.length > 0);
  const products = usePlannerProducts(canReadProducts && partIds.length > 0);

  const systemOfPart = (partId: number) => {
    const jobId = parts.find((q) => q.data?.id === partId)?.data?.jobId;
    const job = jobs.find((q) => q.data?.id === jobId)?.data;
    return { job, system: systems.data?.items.find((s) => s.id === job?.finishSystemId) };
  };
  const items = session.items.filter((item) => partIds.slice(0, partLookupLimit).includes(item.partId));
  const rows = items.map((item) => {
    const part = parts.find((q) => q.data?.id === item.partId)?.data;
    const { job, system } = systemOfPart(item.partId);
    const step = coatStep(system, item.stepPosition);
    return { partId: item.partId, label: part?.label ?? `Part ${item.partId}`, jobReference: job?.reference ?? null, coat: step ? step.productName : 'Coat not set', sprayedAt: item.sprayedAt };
  });
  const productIds = unique(items.flatMap((item) => coatStep(systemOfPart(item.partId).system, item.stepPosition)?.productId ?? []));
  const known = productIds.flatMap((id) => products.data?.items.find((p: Product) => p.id === id) ?? []);

  const gaps: string[] = [];
  if (partIds.length > partLookupLimit) gaps.push(`Only the first ${partLookupLimit} of ${partIds.length} parts were read; check the products of the rest.`);
  if (items.some((item) => item.stepPosition === null)) gaps.push('Some parts have no coat chosen, so their products are not known.');
  if (!canReadProducts && productIds.length > 0) gaps.push('Your role does not read data sheets, so product hazards are not shown here.');
  if (parts.some((q) => q.isError) || jobs.some((q) => q.isError) || systems.isError || products.isError) gaps.push('Some of the plan could not be loaded.');

  const pending = parts.some((q) => q.isPending) || jobs.some((q) => q.isPending) || (partIds.length > 0 && systems.isPending) || (canReadProducts && partIds.length > 0 && products.isPending);
  return { pending, rows, products: known.map(({ name, chemistry, hazards }) => ({ name, chemistry, hazards })), gaps };
}
