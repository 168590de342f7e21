import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import { respiratorLevel } from '../../../../shared/finishing/cautions';
import type { Booth } from '../../../../shared/schemas/booth';
import { checklistSchema, type Checklist } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import type { Reading } from '../../../../shared/schemas/reading';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateReading } from '../../../api/readings/create-reading';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { liveChecklist, startBlockedReason } from '../utils/live-checklist';
import { withoutFieldPrefix } from '../utils/server-errors';
import { shopWhen } from '../utils/session-format';
import { ConditionFields, EquipmentChecks, type ChecklistInput } from './checklist-fields';
import { ChecklistVerdict } from './checklist-verdict';
import { OverrideReasonField } from './override-reason-field';

const fieldNames = Object.keys(checklistSchema.shape);

/** The last checks if there were any (a sprayer re-checks after a fix), else the booth's latest reading. */
function startingValues(session: SpraySession, reading: Reading | null): DefaultValues<ChecklistInput> {
  if (session.checklist) {
    const { verdict: _v, problems: _p, completedAt: _c, completedByName: _b, ...checks } = session.checklist;
    return { ...checks, overrideReason: null };
  }
  return {
    extractionRunning: false,
    filtersChecked: false,
    faceVelocityMps: null,
    respiratorFitted: false,
    airTempC: reading?.airTempC,
    relativeHumidityPct: reading?.relativeHumidityPct,
    surfaceTempC: reading?.surfaceTempC ?? undefined,
    overrideReason: null,
  };
}

interface ChecklistFormProps {
  session: SpraySession;
  booth: Booth;
  /** null while the data sheets are still loading. */
  products: Product[] | null;
  reading: Reading | null;
  units: UnitSystem;
  timeZone: string;
  canOverride: boolean;
}

export function ChecklistForm({ session, booth, products, reading, units, timeZone, canOverride }: ChecklistFormProps) {
  const update = useUpdateSpraySession();
  const createReading = useCreateReading();
  const blockedId = useId();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ChecklistInput, unknown, Checklist>({ resolver: zodResolver(checklistSchema), defaultValues: startingValues(session, reading) });
  const { control, handleSubmit, setError, formState } = form;
  const values = useWatch({ control });
  const live = liveChecklist(values, booth, products);
  const blocked = startBlockedReason(live, canOverride, values.overrideReason);

  // The typed conditions also go into the booth's readings, so the next form starts from them.
  const keepReading = ({ airTempC, relativeHumidityPct, surfaceTempC }: Checklist) => {
    const same = reading && reading.airTempC === airTempC && reading.relativeHumidityPct === relativeHumidityPct && reading.surfaceTempC === surfaceTempC;
    if (!same) createReading.mutate({ boothId: booth.id, airTempC, relativeHumidityPct, surfaceTempC });
  };

  const save = (start: boolean) =>
    handleSubmit(async (checklist) => {
      setFormError(null);
      const state = start ? 'spraying' : session.state === 'planned' ? 'checking' : undefined;
      try {
        await update.mutateAsync({ id: session.id, changes: { checklist, ...(state ? { state } : {}) } });
        toast.success(start ? 'Spraying started. The checks are recorded with it.' : 'Checks recorded.');
        keepReading(checklist);
      } catch (error) {
        setFormError(applyServerErrors(withoutFieldPrefix(error, 'checklist.'), setError, fieldNames));
      }
    });

  return (
    <form noValidate onSubmit={(event) => event.preventDefault()} className="space-y-5">
      <FormAlert message={formError} />
      <EquipmentChecks control={control} errors={formState.errors} units={units} minFaceVelocityMps={booth.minFaceVelocityMps} neededRespirator={products?.length ? respiratorLevel(products) : null} />
      <div>
        <h3 className="text-lg font-semibold">Conditions in the booth</h3>
        <p className="mb-2 text-maple-700">
          {reading ? `Filled in from the ${reading.source === 'sensor' ? 'sensor' : 'typed'} reading at ${shopWhen(reading.at, timeZone)}; correct them if they have changed.` : 'No reading yet for this booth: measure and type them in.'}
        </p>
        <ConditionFields control={control} errors={formState.errors} units={units} />
      </div>
      <ChecklistVerdict evaluation={live.evaluation} missing={live.missing} dew={live.dew} units={units} />
      {canOverride && live.evaluation?.verdict === 'stop' && <OverrideReasonField register={form.register} error={formState.errors.overrideReason?.message} />}
      <div className="flex flex-wrap items-start gap-3">
        <Button variant="secondary" className="min-h-16 px-6 text-lg" onClick={save(false)} pending={update.isPending} pendingText="Saving…">
          Record checks
        </Button>
        <div>
          <Button className="min-h-16 px-8 text-xl" onClick={save(true)} disabled={blocked !== null} pending={update.isPending} pendingText="Starting…" aria-describedby={blocked ? blockedId : undefined}>
            Start spraying
          </Button>
          {blocked && (
            <p id={blockedId} className="mt-2 max-w-md font-medium text-verdict-stop">
              <span aria-hidden="true">✕ </span>
              {blocked}
            </p>
          )}
        </div>
      </div>
    </form>
  );
}
