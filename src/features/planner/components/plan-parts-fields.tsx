import { useId, useState } from 'react';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import { inputClasses } from '../../../components/ui/field';
import { formatNumber } from '../../../lib/units-display';
import { useJobParts } from '../../../api/parts/get-job-parts';
import { usePlannableJobs } from '../api/get-plannable-jobs';
import { useFinishSystems } from '../../../api/finish-systems/get-finish-systems';

export interface PartsPlan {
  items: { partId: number; stepPosition: number | null }[];
  areaM2: number;
}

type CoatStep = Extract<FinishSystem['steps'][number], { kind: 'coat' }>;

function coatStepsOf(systems: FinishSystem[] | undefined, systemId: number | null | undefined): CoatStep[] {
  const system = systems?.find((s) => s.id === systemId);
  return system?.steps.filter((step): step is CoatStep => step.kind === 'coat') ?? [];
}

interface PlanPartsFieldsProps {
  /** Null: nothing picked, so the session keeps the parts it has (none for a new booking). */
  onPlan: (plan: PartsPlan | null) => void;
  keeping: number;
}

/** Which job's parts the session sprays, and which coat of the finish system; their area sets the suggested length. */
export function PlanPartsFields({ onPlan, keeping }: PlanPartsFieldsProps) {
  const ids = { job: useId(), step: useId() };
  const jobs = usePlannableJobs();
  const systems = useFinishSystems();
  const [jobId, setJobId] = useState<number | null>(null);
  const [stepPosition, setStepPosition] = useState<number | null>(null);
  const [chosen, setChosen] = useState<number[]>([]);
  const parts = useJobParts(jobId);
  const job = jobs.data?.find((j) => j.id === jobId);
  const coatSteps = coatStepsOf(systems.data?.items, job?.finishSystemId);
  const partList = parts.data?.items ?? [];

  const report = (nextChosen: number[], nextStep: number | null) => {
    const picked = partList.filter((part) => nextChosen.includes(part.id));
    if (picked.length === 0) return onPlan(null);
    onPlan({ items: picked.map((part) => ({ partId: part.id, stepPosition: nextStep })), areaM2: picked.reduce((sum, part) => sum + part.coatedAreaM2, 0) });
  };
  const chooseJob = (value: string) => {
    const nextJob = value === '' ? null : Number(value);
    const firstCoat = coatStepsOf(systems.data?.items, jobs.data?.find((j) => j.id === nextJob)?.finishSystemId)[0];
    setJobId(nextJob);
    setChosen([]);
    setStepPosition(firstCoat?.position ?? null);
    onPlan(null);
  };
  const choose = (next: number[]) => {
    setChosen(next);
    report(next, stepPosition);
  };
  const chooseStep = (value: string) => {
    const next = value === '' ? null : Number(value);
    setStepPosition(next);
    report(chosen, next);
  };

  const area = partList.filter((part) => chosen.includes(part.id)).reduce((sum, part) => sum + part.coatedAreaM2, 0);
  return (
    <fieldset className="rounded-panel border border-maple-300 bg-white p-3 sm:col-span-2">
      <legend className="px-1 font-semibold">Parts to spray</legend>
      {keeping > 0 && jobId === null && <p className="mb-2 text-sm text-maple-700">Keeps its {keeping} planned parts unless you choose others.</p>}
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label htmlFor={ids.job} className="mb-1 block font-medium">
            Job
          </label>
          <select id={ids.job} className={inputClasses} value={jobId ?? ''} onChange={(event) => chooseJob(event.target.value)} disabled={!jobs.data}>
            <option value="">{jobs.isPending ? 'Loading jobs…' : jobs.isError ? 'Jobs could not be loaded' : 'No job chosen'}</option>
            {jobs.data?.map((j) => (
              <option key={j.id} value={j.id}>
                {j.reference} · {j.customer}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={ids.step} className="mb-1 block font-medium">
            Coat
          </label>
          <select id={ids.step} className={inputClasses} value={stepPosition ?? ''} onChange={(event) => chooseStep(event.target.value)} disabled={coatSteps.length === 0}>
            <option value="">{job && !job.finishSystemId ? 'The job has no finish system yet' : 'Not set'}</option>
            {coatSteps.map((step, index) => (
              <option key={step.position} value={step.position}>
                Coat {index + 1} of {coatSteps.length}: {step.productName}, {step.dryFilmUm} µm dry
              </option>
            ))}
          </select>
        </div>
      </div>
      {jobId !== null && <PartChoices parts={partList} pending={parts.isPending} chosen={chosen} onChoose={choose} />}
      {chosen.length > 0 && (
        <p className="mt-2 font-medium">
          {chosen.length} {chosen.length === 1 ? 'part' : 'parts'} chosen, {formatNumber(area, 2)} m² to spray
        </p>
      )}
    </fieldset>
  );
}

interface PartChoicesProps {
  parts: { id: number; label: string; quantity: number; coatedAreaM2: number }[];
  pending: boolean;
  chosen: number[];
  onChoose: (next: number[]) => void;
}

function PartChoices({ parts, pending, chosen, onChoose }: PartChoicesProps) {
  if (pending) return <p className="mt-3 text-maple-700">Loading the job’s parts…</p>;
  if (parts.length === 0) return <p className="mt-3 text-maple-700">This job has no parts yet.</p>;
  const all = chosen.length === parts.length;
  return (
    <div className="mt-3">
      <button type="button" className="min-h-touch font-semibold text-lacquer-800 underline underline-offset-4" onClick={() => onChoose(all ? [] : parts.map((p) => p.id))}>
        {all ? 'Clear all parts' : `Choose all ${parts.length} parts`}
      </button>
      <ul className="max-h-56 overflow-y-auto rounded-panel border border-maple-200">
        {parts.map((part) => (
          <li key={part.id} className="border-b border-maple-100 last:border-b-0">
            <label className="flex min-h-touch items-center gap-3 px-2">
              <input
                type="checkbox"
                className="size-5 accent-lacquer-700"
                checked={chosen.includes(part.id)}
                onChange={(event) => onChoose(event.target.checked ? [...chosen, part.id] : chosen.filter((id) => id !== part.id))}
              />
              <span className="font-medium">{part.label}</span>
              <span className="ml-auto text-sm text-maple-700">
                {part.quantity} × · {formatNumber(part.coatedAreaM2, 2)} m²
              </span>
            </label>
          </li>
        ))}
      </ul>
    </div>
  );
}
