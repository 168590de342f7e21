import { useState } from 'react';
import type { FilterBank } from '../../../../shared/schemas/upkeep';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useBoothUpkeep } from '../../../api/upkeep/get-booth-upkeep';
import { ExtractionTestForm } from './extraction-test-form';
import { FilterBankCard, type BankAction } from './filter-bank-card';
import { FilterBankForm } from './filter-bank-form';
import { FireInspectionForm } from './fire-inspection-form';
import { FilterChangeForm, GaugeReadingForm } from './gauge-forms';
import { ExtractionPanel, FirePanel } from './test-panels';
import { UpkeepHistory } from './upkeep-history';

type Open = { kind: 'new-bank' | 'extraction' | 'fire' } | { kind: BankAction; bank: FilterBank } | null;

interface BoothUpkeepViewProps {
  boothId: number;
  timeZone: string;
  today: string;
  canLog: boolean;
  canWrite: boolean;
}

const titles = { 'new-bank': 'Add a filter bank', extraction: 'Record an extraction test', fire: 'Record a fire-protection inspection', reading: 'Log a gauge reading', change: 'Log a filter change', edit: 'Edit filter bank' } as const;

/** One booth's filter banks, extraction test, fire inspection and recent record, with the forms to add to them. */
export function BoothUpkeepView({ boothId, timeZone, today, canLog, canWrite }: BoothUpkeepViewProps) {
  const upkeep = useBoothUpkeep(boothId);
  const [open, setOpen] = useState<Open>(null);
  const close = () => setOpen(null);
  if (upkeep.isPending) return <LoadingState what="the booth’s upkeep" />;
  if (upkeep.isError) return <ErrorState error={upkeep.error} what="the booth’s upkeep" onRetry={() => upkeep.refetch()} />;
  const data = upkeep.data;
  const bankOf = (o: Open) => (o && 'bank' in o ? o.bank : undefined);

  return (
    <div className="space-y-6">
      <section aria-labelledby="filter-banks" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <h2 id="filter-banks" className="text-xl font-semibold">
              Filters
            </h2>
            <p className="text-maple-700">Read each bank’s gauge; change the filters at the pressure drop its maker gives.</p>
          </div>
          {canWrite && (
            <Button variant="secondary" onClick={() => setOpen({ kind: 'new-bank' })}>
              Add filter bank
            </Button>
          )}
        </div>
        {data.banks.length === 0 ? (
          <EmptyState title="No filter banks yet">{canWrite ? 'Add each bank of filters with the pressure drop its maker says to change it at.' : 'The finishing lead adds the booth’s filter banks.'}</EmptyState>
        ) : (
          <ul className="grid gap-3 md:grid-cols-2 xl:grid-cols-3">
            {data.banks.map((bank) => (
              <FilterBankCard key={bank.id} bank={bank} timeZone={timeZone} canLog={canLog} canEdit={canWrite} onAction={(kind, b) => setOpen({ kind, bank: b })} />
            ))}
          </ul>
        )}
      </section>
      <div className="grid gap-4 lg:grid-cols-2">
        <ExtractionPanel upkeep={data} onRecord={canWrite ? () => setOpen({ kind: 'extraction' }) : undefined} />
        <FirePanel upkeep={data} onRecord={canWrite ? () => setOpen({ kind: 'fire' }) : undefined} />
      </div>
      <UpkeepHistory upkeep={data} timeZone={timeZone} />
      <Dialog open={open !== null} onClose={close} wide={open?.kind === 'extraction'} title={open ? `${titles[open.kind]}${bankOf(open) ? `: ${bankOf(open)!.name}` : ''}` : ''} description={`${data.booth.name}.`}>
        {open?.kind === 'new-bank' && <FilterBankForm boothId={boothId} onDone={close} />}
        {open?.kind === 'edit' && <FilterBankForm boothId={boothId} bank={open.bank} onDone={close} />}
        {open?.kind === 'reading' && <GaugeReadingForm bank={open.bank} onDone={close} />}
        {open?.kind === 'change' && <FilterChangeForm bank={open.bank} onDone={close} />}
        {open?.kind === 'extraction' && <ExtractionTestForm boothId={boothId} minFaceVelocityMps={data.booth.minFaceVelocityMps} intervalMonths={data.intervals.extractionTestMonths} today={today} onDone={close} />}
        {open?.kind === 'fire' && <FireInspectionForm boothId={boothId} intervalMonths={data.intervals.fireInspectionMonths} today={today} onDone={close} />}
      </Dialog>
    </div>
  );
}
