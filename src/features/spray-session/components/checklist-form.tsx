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
import type { SpraySession, SpraySessionState } from '../../../../shared/schemas/spray-session';
import type { SessionFitness } from '../../../../shared/schemas/upkeep';
import { FitnessFindings } from '../../../components/safety/fitness-findings';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useNow } from '../../../lib/use-now';
import { useCreateReading } from '../../../api/readings/create-reading';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { useSendOrKeep } from '../hooks/use-send-or-keep';
import { newIdempotencyKey } from '../utils/idempotency';
import { currentReading, liveChecklist, startBlockedReason } from '../utils/live-checklist';
import { withoutFieldPrefix } from '../utils/server-errors';
import { shopWhen } from '../utils/session-format';
import { ConditionFields, EquipmentChecks, type ChecklistInput } from './checklist-fields';
import { ChecklistVerdict } from './checklist-verdict';
import { OverrideReasonField } from './override-reason-field';

const fieldNames = Object.keys(checklistSchema.shape);

/** The last checks if there were any (a sprayer re-checks after a fix), else the booth's latest reading. */
function startingValues(session: SpraySession, reading: Reading | null): DefaultValues<ChecklistInput> {
  if (session.checklist) {
    const { verdict: _v, problems: _p, notes: _n, completedAt: _c, completedByName: _b, ...checks } = session.checklist;
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

function conditionsSource(reading: Reading | null, current: Reading | null, timeZone: string): string {
  if (current) return `Filled in from the ${current.source === 'sensor' ? 'sensor' : 'typed'} reading at ${shopWhen(current.at, timeZone)}; correct them if they have changed.`;
  if (reading) return `The booth's last reading (${shopWhen(reading.at, timeZone)}) is too old to go on: measure the conditions now and type them in.`;
  return 'No reading yet for this booth: measure and type them in.';
}

interface ChecklistFormProps {
  session: SpraySession;
  booth: Booth;
  /** null while the data sheets are still loading. */
  products: Product[] | null;
  reading: Reading | null;
  /** Fit to spray for each protection; null while it loads, undefined when it could not be read (the server still checks). */
  fitness: SessionFitness | null | undefined;
  units: UnitSystem;
  timeZone: string;
  canOverride: boolean;
}

export function ChecklistForm({ session, booth, products, reading, fitness, units, timeZone, canOverride }: ChecklistFormProps) {
  const update = useUpdateSpraySession();
  const sendOrKeep = useSendOrKeep(session.id);
  const createReading = useCreateReading();
  const blockedId = useId();
  const [formError, setFormError] = useState<string | null>(null);
  const now = useNow(60_000);
  const current = currentReading(reading, now);
  const form = useForm<ChecklistInput, unknown, Checklist>({ resolver: zodResolver(checklistSchema), defaultValues: startingValues(session, current) });
  const { control, handleSubmit, setError, formState } = form;
  const values = useWatch({ control });
  // Judged for the protection the sprayer says they wear: a fit test matters for a tight-fitting facepiece.
  const fit = fitness ? fitness.byRespirator[values.respiratorKind ?? fitness.neededRespirator] : null;
  const live = liveChecklist(values, booth, products, fitness === undefined ? [] : (fit?.findings ?? null));
  const blocked = startBlockedReason(live, canOverride, values.overrideReason);

  // The typed conditions also go into the booth's readings, so the next form starts from them.
  const keepReading = ({ airTempC, relativeHumidityPct, surfaceTempC }: Checklist) => {
    const same = reading && reading.airTempC === airTempC && reading.relativeHumidityPct === relativeHumidityPct && reading.surfaceTempC === surfaceTempC;
    if (!same) createReading.mutate({ boothId: booth.id, airTempC, relativeHumidityPct, surfaceTempC });
  };

  const save = (start: boolean) =>
    handleSubmit(async (checklist) => {
      setFormError(null);
      const state: SpraySessionState | undefined = start ? 'spraying' : session.state === 'planned' ? 'checking' : undefined;
      const changes = { checklist, ...(state ? { state } : {}), changedAt: new Date().toISOString(), idempotencyKey: newIdempotencyKey() };
      const write = { kind: 'session' as const, spraySessionId: session.id, body: changes, verdict: live.evaluation, label: start ? 'Checks, and spraying started' : 'Checks' };
      try {
        const outcome = await sendOrKeep(write, () => update.mutateAsync({ id: session.id, changes }));
        if (outcome.kind === 'queued') return void toast.warning('No connection: the checks are kept on this tablet and sent when the connection is back.');
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
          {conditionsSource(reading, current, timeZone)}
        </p>
        <ConditionFields control={control} errors={formState.errors} units={units} />
      </div>
      {fitness && fit && <FitnessFindings verdict={fit.verdict} findings={fit.findings} crewShown={fitness.crewShown} deferLine={fitness.deferLine} />}
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
