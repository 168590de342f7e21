import { useState } from 'react';
import { Link } from 'react-router-dom';
import { crewRecordKindLabels, crewRecordKinds, type CrewRecord, type CrewRecordKind } from '../../../../shared/schemas/crew';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useCrewPerson } from '../../../api/crew/get-crew-person';
import { crewLabel, crewTone, dayWords } from './crew-format';
import { CrewRecordForm } from './crew-record-form';

interface CrewPersonPageProps {
  userId: number;
  isSelf: boolean;
  canRecord: boolean;
  /** Whether to offer the way back to the whole crew's list. */
  canListCrew: boolean;
  today: string;
  intervals: { fitTestMonths: number; healthSurveillanceMonths: number };
}

const statusKey = { 'fit-test': 'fitTest', 'health-surveillance': 'healthSurveillance', training: 'training' } as const;

function RecordLine({ record }: { record: CrewRecord }) {
  const what = record.kind === 'fit-test' ? `${record.respiratorModel} — ${record.result === 'pass' ? 'pass' : 'fail'}` : record.kind === 'training' ? record.title : 'Health surveillance';
  return (
    <li className="py-2">
      <p className="font-semibold">
        {dayWords(record.doneOn)}: {what}
      </p>
      <p className="text-maple-800">
        Next due {dayWords(record.nextDueOn)} · recorded by {record.recordedByName}
        {record.notes && <span className="block">{record.notes}</span>}
      </p>
    </li>
  );
}

function KindSection({ kind, records, status }: { kind: CrewRecordKind; records: CrewRecord[]; status: Parameters<typeof crewLabel>[0] }) {
  return (
    <section aria-label={crewRecordKindLabels[kind]} className="rounded-panel border border-maple-300 bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">{crewRecordKindLabels[kind]}</h2>
        <StatusBadge tone={crewTone[status]}>{crewLabel(status)}</StatusBadge>
      </div>
      {records.length === 0 ? <p className="mt-1 text-maple-800">None recorded.</p> : <ul className="divide-y divide-maple-200">{records.map((r) => <RecordLine key={r.id} record={r} />)}</ul>}
    </section>
  );
}

/** One person's protection records in full: shown to them and to the owner, who records them. */
export function CrewPersonPage({ userId, isSelf, canRecord, canListCrew, today, intervals }: CrewPersonPageProps) {
  const person = useCrewPerson(userId);
  const [adding, setAdding] = useState(false);
  if (person.isPending) return <LoadingState what="the records" />;
  if (person.isError) return <ErrorState error={person.error} what="the records" onRetry={() => person.refetch()} />;
  const { status, records } = person.data;
  return (
    <>
      <PageHeader
        title={isSelf ? 'My crew records' : `Crew records: ${status.name}`}
        description={isSelf ? 'Your face-fit tests, health surveillance and training, as the owner has recorded them. Only you and the owner see these details.' : 'Only this person and the owner see these details; a lead sees the status only.'}
        actions={
          <>
            {canListCrew && (
              <Link to="/crew" className="inline-flex min-h-touch items-center px-2 font-semibold text-lacquer-800 underline underline-offset-4">
                Whole crew
              </Link>
            )}
            {canRecord && <Button onClick={() => setAdding(true)}>Add a record</Button>}
          </>
        }
      />
      <div className="grid gap-4 lg:grid-cols-3">
        {crewRecordKinds.map((kind) => (
          <KindSection key={kind} kind={kind} status={status[statusKey[kind]]} records={records.filter((r) => r.kind === kind)} />
        ))}
      </div>
      {isSelf && !canRecord && <p className="mt-4 text-maple-700">Something missing or wrong? Give the certificate or letter to the owner to record.</p>}
      <Dialog open={adding} onClose={() => setAdding(false)} title={`Add a record for ${status.name}`} description="From the certificate, letter or training record.">
        <CrewRecordForm userId={userId} name={status.name} today={today} intervals={intervals} onDone={() => setAdding(false)} />
      </Dialog>
    </>
  );
}
