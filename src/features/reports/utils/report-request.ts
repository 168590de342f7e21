import { reportRangeQuerySchema } from '../../../../shared/schemas/report';
import type { ReportKind, ReportParams } from '../../../api/reports/report-keys';
import type { ReportAddress } from '../hooks/use-report-address';

export type ReportRequest = { [K in ReportKind]: { kind: K; params: ReportParams[K] } }[ReportKind];

/** The range checked with the server's own rules, so a bad range is explained before anything is asked. */
export function rangeErrors(address: ReportAddress): { from?: string; to?: string } {
  const checked = reportRangeQuerySchema.safeParse(address.range);
  if (checked.success) return {};
  return Object.fromEntries(checked.error.issues.map((issue) => [String(issue.path[0]), issue.message]));
}

/**
 * What to ask the server for; null while something it needs is missing (a valid range, a booth for
 * conditions). `siteId` is an admin's choice of one site; left out, the server reports every site
 * (for an admin) or the user's own.
 */
export function reportRequest(address: ReportAddress, conditionsBoothId: number | undefined, siteId?: number): ReportRequest | null {
  if (Object.keys(rangeErrors(address)).length > 0) return null;
  const { from, to } = address.range;
  const site = siteId ? { siteId } : {};
  switch (address.kind) {
    case 'booth-use':
      return { kind: 'booth-use', params: { from, to, ...site, boothId: address.boothId } };
    case 'area-sprayed':
      return { kind: 'area-sprayed', params: { from, to, ...site, groupBy: address.groupBy } };
    case 'conditions':
      return conditionsBoothId ? { kind: 'conditions', params: { from, to, ...site, boothId: conditionsBoothId } } : null;
    case 'material':
      return { kind: 'material', params: { from, to, ...site, jobId: address.jobId } };
    case 'solvent':
    case 'rework':
    case 'upkeep':
      return { kind: address.kind, params: { from, to, ...site } };
  }
}
