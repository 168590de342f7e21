import { useId, useState } from 'react';
import { sprayMethodIds, sprayMethods, type SprayMethod } from '../../../../shared/finishing/material';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { inputClasses } from '../../../components/ui/field';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { isApiError } from '../../../lib/api-client';
import { formatQuantity } from '../../../lib/units-display';
import { useJobEstimate } from '../../../api/jobs/get-job-estimate';
import { estimateBasisWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { missingDataWords } from './estimate-format';
import { EstimateTable } from './estimate-table';

/** A typed TE only counts when it is a usable share; otherwise the method's default is used. */
function parseTransferEfficiency(text: string): number | undefined {
  const value = Number(text);
  return text.trim() !== '' && Number.isFinite(value) && value >= 1 && value <= 100 ? value : undefined;
}

function MethodControls({ method, te, onMethod, onTe }: { method: SprayMethod; te: string; onMethod: (m: SprayMethod) => void; onTe: (t: string) => void }) {
  const methodId = useId();
  const teId = useId();
  const teInvalid = te.trim() !== '' && parseTransferEfficiency(te) === undefined;
  return (
    <div className="mb-4 grid gap-3 sm:grid-cols-[2fr_1fr]">
      <div>
        <label htmlFor={methodId} className="mb-1 block font-medium">
          Spray method
        </label>
        <select id={methodId} className={inputClasses} value={method} onChange={(event) => onMethod(event.target.value as SprayMethod)}>
          {sprayMethodIds.map((id) => (
            <option key={id} value={id}>
              {sprayMethods[id].label} ({sprayMethods[id].transferEfficiencyPct} % transfer efficiency)
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor={teId} className="mb-1 block font-medium">
          Transfer efficiency <span className="font-normal text-maple-700">(%)</span>
        </label>
        <input id={teId} type="number" inputMode="decimal" min={1} max={100} className={inputClasses} value={te} aria-invalid={teInvalid} aria-describedby={`${teId}-hint`} onChange={(event) => onTe(event.target.value)} />
        <p id={`${teId}-hint`} className={`mt-1 text-sm ${teInvalid ? 'font-medium text-verdict-stop' : 'text-maple-700'}`}>
          {teInvalid ? '⚠ Use 1 to 100; the method’s usual figure is used meanwhile.' : 'Share of the sprayed solids that stays on the parts.'}
        </p>
      </div>
    </div>
  );
}

/** Litres, mix, VOC and cost for one coat of each coat step of the job's finish system. */
export function EstimatePanel({ jobId, units }: { jobId: number; units: UnitSystem }) {
  const [method, setMethod] = useState<SprayMethod>('hvlp');
  const [te, setTe] = useState(String(sprayMethods.hvlp.transferEfficiencyPct));
  const typedTe = parseTransferEfficiency(te);
  const estimate = useJobEstimate(jobId, { method, transferEfficiencyPct: typedTe === sprayMethods[method].transferEfficiencyPct ? undefined : typedTe });
  const chooseMethod = (next: SprayMethod) => {
    setMethod(next);
    setTe(String(sprayMethods[next].transferEfficiencyPct));
  };

  return (
    <section aria-labelledby="estimate-heading" className="mt-10">
      <h2 id="estimate-heading" className="text-xl font-semibold text-lacquer-900">
        Material estimate
      </h2>
      <p className="mb-3 max-w-3xl text-maple-700">
        {estimateBasisWords}
      </p>
      <MethodControls method={method} te={te} onMethod={chooseMethod} onTe={setTe} />
      <EstimateBody query={estimate} units={units} />
    </section>
  );
}

function EstimateBody({ query, units }: { query: ReturnType<typeof useJobEstimate>; units: UnitSystem }) {
  const { locale } = useShopFormat();
  if (query.isPending) return <LoadingState what="the estimate" />;
  if (query.isError) {
    if (isApiError(query.error) && query.error.status === 409) return <EmptyState title="No estimate yet">{query.error.message}</EmptyState>;
    return <ErrorState error={query.error} what="the estimate" onRetry={() => query.refetch()} />;
  }
  const estimate = query.data;
  if (estimate.steps.length === 0) return <EmptyState title="Nothing to estimate yet">Add parts to this job; the estimate follows their coated area.</EmptyState>;
  return (
    <>
      <p className="mb-2 font-medium">
        Over {formatQuantity('area', estimate.areaM2, units)} at {estimate.transferEfficiencyPct} % transfer efficiency ({sprayMethods[estimate.method as SprayMethod]?.label ?? estimate.method}).
      </p>
      <EstimateTable estimate={estimate} units={units} locale={locale} />
      {missingDataWords(estimate.totals.stepsWithoutVoc, estimate.totals.stepsWithoutPrice).map((words) => (
        <p key={words} className="mt-2 font-medium text-verdict-caution">
          <span aria-hidden="true">⚠ </span>
          {words}
        </p>
      ))}
    </>
  );
}
