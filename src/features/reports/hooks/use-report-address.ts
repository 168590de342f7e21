import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { areaGroupings } from '../../../../shared/schemas/report';
import { reportKinds, type ReportKind } from '../../../api/reports/report-keys';
import { openingRange, type DateRange } from '../utils/report-range';

export type AreaGrouping = (typeof areaGroupings)[number];

export interface ReportAddress {
  kind: ReportKind;
  range: DateRange;
  boothId?: number;
  groupBy: AreaGrouping;
  jobId?: number;
}

const positiveId = (value: string | null) => {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : undefined;
};
const oneOf = <T extends string>(values: readonly T[], value: string | null, fallback: T): T => values.find((v) => v === value) ?? fallback;

/**
 * The report, range and options live in the address (?report=solvent&from=…&to=…&booth=2), so a
 * link, bookmark or printout names the same report. Opened without a range it shows the last four
 * weeks and writes that range into the address at once, so the link copied then still shows the
 * same days later on.
 */
export function useReportAddress(today: string): [ReportAddress, (patch: Partial<ReportAddress>) => void] {
  const [params, setParams] = useSearchParams();
  const fallback = openingRange(today);
  const address: ReportAddress = {
    kind: oneOf(reportKinds, params.get('report'), 'booth-use'),
    range: { from: params.get('from') || fallback.from, to: params.get('to') || fallback.to },
    boothId: positiveId(params.get('booth')),
    groupBy: oneOf(areaGroupings, params.get('group'), 'product-kind'),
    jobId: positiveId(params.get('job')),
  };
  const change = (patch: Partial<ReportAddress>) => {
    const next = { ...address, ...patch };
    const search = new URLSearchParams({ report: next.kind, from: next.range.from, to: next.range.to });
    if (next.boothId) search.set('booth', String(next.boothId));
    if (next.groupBy !== 'product-kind') search.set('group', next.groupBy);
    if (next.jobId) search.set('job', String(next.jobId));
    // The admin's site choice (`site`) belongs to the page, not to one report: keep it.
    const site = params.get('site');
    if (site) search.set('site', site);
    setParams(search, { replace: true });
  };
  const rangeMissing = !params.get('from') || !params.get('to');
  useEffect(() => {
    if (rangeMissing) change({});
    // Only a missing range is written; change itself is new on every render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [rangeMissing]);
  return [address, change];
}
