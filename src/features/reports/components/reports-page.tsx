import type { ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { Button, buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useBooths } from '../../../api/booths/get-booths';
import { useJobs } from '../../../api/jobs/get-jobs';
import { reportCsvHref } from '../../../api/reports/report-url';
import { useReportAddress, type ReportAddress } from '../hooks/use-report-address';
import { reportCatalogue } from '../utils/report-catalogue';
import { openingRange, quickRange, rangeWords } from '../utils/report-range';
import { rangeErrors, reportRequest } from '../utils/report-request';
import { RangeControls } from './range-controls';
import { EmptyActionProvider } from './report-empty';
import { ReportBody } from './report-body';
import { ReportOptions, type Choice } from './report-options';
import { reportPanelId, ReportPicker, reportTabId } from './report-picker';

interface ReportsPageProps {
  shopName: string;
  timeZone: string;
  /** Today in the shop's calendar, for the quick ranges. */
  today: string;
  units: UnitSystem;
  /** An admin's choice of one site (undefined: every site, or the user's own). */
  siteId?: number;
  /** The admin's site choice, drawn with the other options; nothing for a one-site shop. */
  siteSwitcher?: ReactNode;
}

// Portrait on whatever paper the printer has (A4 or Letter), with room for the printer's own margin.
const pageRule = '@page { size: portrait; margin: 12mm; }';

/** What the options chosen mean, in words, for the printed heading. */
function optionWords(address: ReportAddress, booths: Choice[], jobs: Choice[], conditionsBoothId?: number): string | null {
  const name = (list: Choice[], id?: number) => list.find((item) => item.id === id)?.label;
  if (address.kind === 'booth-use') return `Booth: ${name(booths, address.boothId) ?? 'all booths'}`;
  if (address.kind === 'conditions') return `Booth: ${name(booths, conditionsBoothId) ?? '–'}`;
  if (address.kind === 'area-sprayed') return `Grouped by ${address.groupBy === 'job' ? 'job' : 'product kind'}`;
  if (address.kind === 'material') return `Job: ${name(jobs, address.jobId) ?? 'all jobs'}`;
  return null;
}

/** In place of a report that cannot be asked for yet: a bad range, or the booths still loading or missing. */
function WhyNoReport({ address, booths }: { address: ReportAddress; booths: ReturnType<typeof useBooths> }) {
  const errors = Object.values(rangeErrors(address));
  if (errors.length > 0) return <EmptyState title="Check the date range">{errors.join('. ')}.</EmptyState>;
  if (booths.isPending) return <LoadingState what="the booths" />;
  if (booths.isError) return <ErrorState error={booths.error} what="the booths" onRetry={() => booths.refetch()} />;
  return <EmptyState title="No booths set up">Conditions are reported per booth. Add a booth under Booths first.</EmptyState>;
}

export function ReportsPage({ shopName, timeZone, today, units, siteId, siteSwitcher }: ReportsPageProps) {
  const [address, change] = useReportAddress(today);
  const boothQuery = useBooths({ page: 1, pageSize: 200, siteId });
  const jobQuery = useJobs({ page: 1, pageSize: 200 });
  const booths = (boothQuery.data?.items ?? []).map((b) => ({ id: b.id, label: b.name }));
  const jobs = (jobQuery.data?.items ?? []).map((j) => ({ id: j.id, label: `${j.reference} · ${j.customer}` }));
  const conditionsBoothId = address.boothId ?? booths[0]?.id;
  const request = reportRequest(address, conditionsBoothId, siteId);
  const entry = reportCatalogue[address.kind];
  const options = optionWords(address, booths, jobs, conditionsBoothId);
  const opening = openingRange(today);
  // A quiet month (or a new shop) leaves the opening range empty; a whole year is the usual next question.
  const emptyAction =
    address.range.from === opening.from && address.range.to === opening.to ? (
      <Button variant="secondary" onClick={() => change({ range: quickRange('last-12-months', today) })}>
        Show the last 12 months
      </Button>
    ) : null;

  return (
    <>
      <style>{pageRule}</style>
      <div className="print:hidden">
        <PageHeader
          title="Reports"
          description="How busy the booths were, what was sprayed, what it took, whether conditions were right and how much solvent went up the stack."
          actions={
            <>
              {request ? (
                <a href={reportCsvHref(request.kind, request.params)} download className={buttonClasses('secondary')}>
                  Download CSV
                </a>
              ) : (
                <Button variant="secondary" disabled>
                  Download CSV
                </Button>
              )}
              <Button variant="secondary" onClick={() => window.print()} disabled={!request}>
                Print
              </Button>
            </>
          }
        />
        <div className="mb-6 space-y-4 rounded-panel border border-maple-300 bg-white p-4">
          {siteSwitcher}
          <ReportPicker value={address.kind} onChange={(kind) => change({ kind })} />
          <RangeControls range={address.range} today={today} errors={rangeErrors(address)} onChange={(range) => change({ range })} />
          <ReportOptions kind={address.kind} address={address} conditionsBoothId={conditionsBoothId} booths={booths} jobs={jobs} onChange={change} />
        </div>
      </div>
      <section role="tabpanel" id={reportPanelId} aria-labelledby={reportTabId(address.kind)} className="space-y-4">
        <header className="print:border-b print:border-maple-400 print:pb-2">
          <p className="hidden font-semibold uppercase tracking-wide text-lacquer-700 print:block">{shopName}</p>
          <h2 className="text-2xl font-bold text-lacquer-900">
            {entry.title} · {rangeWords(address.range)}
          </h2>
          {options && <p className="font-medium text-maple-800">{options}</p>}
          <p className="max-w-3xl text-maple-700 print:hidden">{entry.question}</p>
        </header>
        {request ? (
          <EmptyActionProvider value={emptyAction}>
            <ReportBody request={request} units={units} timeZone={timeZone} />
          </EmptyActionProvider>
        ) : (
          <WhyNoReport address={address} booths={boothQuery} />
        )}
      </section>
    </>
  );
}
