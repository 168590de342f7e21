import type { CautionProduct } from '../../../../shared/finishing/cautions';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import { maxPartIds } from '../../../../shared/schemas/part';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useFinishWork } from '../../../api/finish-work/use-finish-work';
import { useParts } from '../../../api/parts/get-parts';

interface PlannedPartRow {
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

const unique = <T>(values: T[]) => [...new Set(values)];

function coatStep(system: FinishSystem | undefined, position: number | null) {
  const step = position === null ? undefined : system?.steps.find((s) => s.position === position);
  return step?.kind === 'coat' ? step : undefined;
}

function gapsOf(
  session: SpraySession,
  partIds: number[],
  productIds: number[],
  canReadProducts: boolean,
  failed: boolean,
): string[] {
  const gaps: string[] = [];
  if (partIds.length > maxPartIds)
    gaps.push(`Only the first ${maxPartIds} of ${partIds.length} parts were read; check the products of the rest.`);
  if (session.items.some((item) => item.stepPosition === null))
    gaps.push('Some parts have no coat chosen, so their products are not known.');
  if (!canReadProducts && productIds.length > 0)
    gaps.push('Your role does not read data sheets, so product hazards are not shown here.');
  if (failed) gaps.push('Some of the plan could not be loaded.');
  return gaps;
}

/** The session's parts with their jobs and coats, and the products those coats use. */
export function useSessionPlan(session: SpraySession, canReadProducts: boolean): SessionPlan {
  const partIds = unique(session.items.map((item) => item.partId));
  const parts = useParts(partIds);
  const partById = new Map((parts.data ?? []).map((part) => [part.id, part]));
  const work = useFinishWork(
    [...partById.values()].map((part) => part.jobId),
    { products: canReadProducts },
  );

  const jobOf = (partId: number) => work.jobs.get(partById.get(partId)?.jobId ?? 0);
  const systemOf = (partId: number) => work.systemByJob.get(partById.get(partId)?.jobId ?? 0);
  const items = session.items.filter((item) => partIds.slice(0, maxPartIds).includes(item.partId));
  const rows = items.map((item) => {
    const step = coatStep(systemOf(item.partId), item.stepPosition);
    const label = partById.get(item.partId)?.label ?? `Part ${item.partId}`;
    return {
      partId: item.partId,
      label,
      jobReference: jobOf(item.partId)?.reference ?? null,
      coat: step ? step.productName : 'Coat not set',
      sprayedAt: item.sprayedAt,
    };
  });
  const productIds = unique(
    items.flatMap((item) => coatStep(systemOf(item.partId), item.stepPosition)?.productId ?? []),
  );
  const known = productIds.flatMap((id) => work.products.get(id) ?? []);
  const failed = parts.isError || Boolean(work.error);
  const pending = (partIds.length > 0 && parts.isPending) || work.pending;
  return {
    pending,
    rows,
    products: known.map(({ name, chemistry, hazards }) => ({ name, chemistry, hazards })),
    gaps: gapsOf(session, partIds, productIds, canReadProducts, failed),
  };
}
