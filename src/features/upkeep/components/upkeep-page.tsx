import type { ReactNode } from 'react';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useBooths } from '../../../api/booths/get-booths';
import { useUpkeepDue } from '../../../api/upkeep/get-upkeep-due';
import { BoothUpkeepView } from './booth-upkeep-view';
import { DueSummary } from './due-summary';

interface UpkeepPageProps {
  boothId: number | undefined;
  onBooth: (boothId: number) => void;
  timeZone: string;
  today: string;
  canLog: boolean;
  canWrite: boolean;
  /** For an admin of several sites: the one looked at (left out: all), and the switcher. */
  siteId?: number;
  siteSwitcher?: ReactNode;
}

/** Booth upkeep: fitness to spray across the site, then one booth's filters, tests and record. */
export function UpkeepPage({ boothId, onBooth, timeZone, today, canLog, canWrite, siteId, siteSwitcher }: UpkeepPageProps) {
  // Every booth of the site looked at: a shop has a handful.
  const booths = useBooths({ page: 1, pageSize: 200, siteId });
  const due = useUpkeepDue(siteId);
  const items = booths.data?.items ?? [];
  const chosen = items.find((b) => b.id === boothId) ?? items[0];

  return (
    <>
      <PageHeader
        title="Booth upkeep"
        description="Filters, extraction tests and fire protection, kept as evidence beside the coat log. Follow your local regulations and the booth maker’s instructions; the intervals here are the shop’s own settings."
        actions={siteSwitcher}
      />
      <div className="space-y-6">
        {due.isPending ? <LoadingState what="what is due" /> : due.isError ? <ErrorState error={due.error} what="what is due" onRetry={() => due.refetch()} /> : <DueSummary due={due.data} />}
        {booths.isPending ? (
          <LoadingState what="the booths" />
        ) : booths.isError ? (
          <ErrorState error={booths.error} what="the booths" onRetry={() => booths.refetch()} />
        ) : !chosen ? (
          <EmptyState title="No booths yet">Booths are added under Booths; their upkeep is kept here.</EmptyState>
        ) : (
          <>
            <FieldShell label="Booth" className="max-w-md">
              {(control) => (
                <select className={inputClasses} {...control} value={chosen.id} onChange={(event) => onBooth(Number(event.target.value))}>
                  {items.map((booth) => (
                    <option key={booth.id} value={booth.id}>
                      {booth.name}
                    </option>
                  ))}
                </select>
              )}
            </FieldShell>
            <BoothUpkeepView key={chosen.id} boothId={chosen.id} timeZone={timeZone} today={today} canLog={canLog} canWrite={canWrite} />
          </>
        )}
      </div>
    </>
  );
}
