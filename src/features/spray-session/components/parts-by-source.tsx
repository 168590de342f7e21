import { useId, useState } from 'react';
import { useJobs } from '../../../api/jobs/get-jobs';
import { useRacks } from '../../../api/racks/get-racks';
import { useReady } from '../../../api/ready/get-ready';
import { inputClasses } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/states';

// A shop's open job book and its racks fit one page each.
const onePage = { page: 1, pageSize: 200 };
import { fromReady, type PickedPart } from '../utils/picked-part';
import { PartChecklist } from './part-checklist';

interface SourceProps {
  chosen: number[];
  onChange: (chosen: number[], parts: PickedPart[]) => void;
}

function ReadyList({ filter, chosen, onChange }: SourceProps & { filter: { jobId: number } | { rackId: number } }) {
  const ready = useReady(filter);
  if (ready.isPending) return <LoadingState what="the parts" />;
  if (ready.isError) return <ErrorState error={ready.error} what="the parts" onRetry={() => ready.refetch()} />;
  const parts = ready.data.items.map(fromReady);
  return <PartChecklist parts={parts} chosen={chosen} onChange={(next) => onChange(next, parts)} label="Parts" />;
}

function Chooser({ label, options, value, onChange }: { label: string; options: { value: number; label: string }[]; value: number | null; onChange: (value: number | null) => void }) {
  const id = useId();
  return (
    <div className="mb-3">
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      <select id={id} className={inputClasses} value={value ?? ''} onChange={(event) => onChange(event.target.value ? Number(event.target.value) : null)}>
        <option value="">Choose…</option>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}

export function PartsByJob(props: SourceProps) {
  const jobs = useJobs(onePage);
  const [jobId, setJobId] = useState<number | null>(null);
  if (jobs.isPending) return <LoadingState what="the jobs" />;
  if (jobs.isError) return <ErrorState error={jobs.error} what="the jobs" onRetry={() => jobs.refetch()} />;
  const options = jobs.data.items.filter((job) => job.state !== 'cancelled').map((job) => ({ value: job.id, label: `${job.reference} · ${job.customer}` }));
  return (
    <div>
      <Chooser label="Job" options={options} value={jobId} onChange={setJobId} />
      {jobId !== null && <ReadyList filter={{ jobId }} {...props} />}
    </div>
  );
}

export function PartsByRack(props: SourceProps) {
  const racks = useRacks(onePage);
  const [rackId, setRackId] = useState<number | null>(null);
  if (racks.isPending) return <LoadingState what="the racks" />;
  if (racks.isError) return <ErrorState error={racks.error} what="the racks" onRetry={() => racks.refetch()} />;
  return (
    <div>
      <Chooser label="Rack" options={racks.data.items.map((rack) => ({ value: rack.id, label: rack.name }))} value={rackId} onChange={setRackId} />
      {rackId !== null && <ReadyList filter={{ rackId }} {...props} />}
    </div>
  );
}
