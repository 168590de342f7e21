import { useState } from 'react';
import { toast } from 'sonner';
import type { Coat } from '../../../../shared/schemas/coat';
import type { Mix } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Reading } from '../../../../shared/schemas/reading';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useOnline } from '../../../lib/use-online';
import { coatEntryFields, useCoatForm } from '../hooks/use-coat-form';
import { useCoatPreview } from '../hooks/use-coat-preview';
import { useRecordCoat } from '../hooks/use-record-coat';
import { useStopReasons } from '../hooks/use-stop-reasons';
import type { SessionPlan } from '../hooks/use-session-plan';
import type { PickedPart } from '../utils/picked-part';
import { nextCoatPosition, type FinishWork } from '../utils/session-plan';
import { newIdempotencyKey } from '../utils/idempotency';
import { repeatsStep } from '../utils/respray';
import { CoatConditionFields, CoatMaterialFields } from './coat-material-fields';
import { CoatPreviewPanel } from './coat-preview-panel';
import { PartPicker } from './part-picker';
import { ReworkReasonField } from './rework-reason-field';

interface CoatFormProps {
  session: SpraySession;
  plan: SessionPlan;
  planned: PickedPart[];
  /** Planned parts whose next coat is the planned step: chosen to start with. */
  due: number[];
  mixes: Mix[];
  sessionCoats: Coat[];
  reading: Reading | null;
  units: UnitSystem;
  timeZone: string;
}

/** The coat is the part's next one, and its finish system (or a closed window) asks for a denib before it. */
function needsDenibFirst(part: PickedPart, position: number | undefined, work: FinishWork): boolean {
  const ready = work.ready.get(part.id);
  return Boolean(ready?.abradeRequired) && position !== undefined && position === nextCoatPosition(work.systemByJob.get(part.jobId), ready);
}

/** Parts chosen for this coat that need their denib first. */
function DenibFirstNote({ parts }: { parts: PickedPart[] }) {
  if (parts.length === 0) return null;
  const names = parts.length <= 3 ? parts.map((p) => p.label).join(', ') : `${parts.length} of the chosen parts`;
  return (
    <p role="note" className="rounded-panel border-2 border-verdict-caution bg-white p-3 text-lg">
      <span className="font-semibold">Denib first:</span> {names} {parts.length === 1 ? 'needs its' : 'need their'} denib before this coat. Record it under “Denib between coats”.
    </p>
  );
}

/** "Go" on a tablet keyboard after typing a reading must not record the coat; only the big button does. */
function keepEnterFromSubmitting(event: React.KeyboardEvent<HTMLFormElement>) {
  if (event.key === 'Enter' && event.target instanceof HTMLInputElement) event.preventDefault();
}

export function CoatForm({ session, plan, planned, due, mixes, sessionCoats, reading, units, timeZone }: CoatFormProps) {
  const coat = useCoatForm(session, plan, planned, due, mixes, reading);
  const online = useOnline();
  const { form, values, step, product } = coat;
  const { register, control, handleSubmit, setError, setValue, formState } = form;
  const preview = useCoatPreview({ coat, sessionCoats, units, timeZone });
  const { record, pending } = useRecordCoat(session.id);
  const stops = useStopReasons(preview.warnings);
  const [formError, setFormError] = useState<string | null>(null);

  const onSubmit = handleSubmit(async (entry) => {
    setFormError(null);
    const acks = stops.check();
    if (!acks || !step || !product) return setFormError(!step || !product ? 'Choose the step this coat is.' : 'Say why this coat goes on despite the stops before recording it.');
    if (coat.mixedSystems) return setFormError('These parts follow different finish systems. Record them as separate coats.');
    const body = { ...entry, spraySessionId: session.id, productId: product.id, sprayedAt: new Date().toISOString(), dryingTempC: null, acknowledgements: acks, idempotencyKey: newIdempotencyKey() };
    const outcome = await record(body, `${product.name} on ${entry.partIds.length === 1 ? '1 part' : `${entry.partIds.length} parts`}`);
    if (outcome.kind === 'failed') return setFormError(applyServerErrors(outcome.error, setError, coatEntryFields));
    if (outcome.kind === 'saved') toast.success(`Coat recorded on ${entry.partIds.length === 1 ? '1 part' : `${entry.partIds.length} parts`}. Its drying times are below.`);
    else toast.warning('No connection: the coat is kept on this tablet and will be sent when the connection is back.');
    setValue('wetFilmUm', null);
    setValue('notes', '');
    setValue('reworkReason', null);
    stops.clear();
    coat.startNext(entry.partIds);
  });

  return (
    <form noValidate onSubmit={onSubmit} onKeyDown={keepEnterFromSubmitting} className="space-y-5">
      <FormAlert message={formError} />
      <PartPicker chosen={values.partIds?.flatMap((id) => (id === undefined ? [] : [id])) ?? []} known={coat.known} planned={planned} onChange={coat.choose} error={formState.errors.partIds?.message} />
      {coat.mixedSystems && <p className="font-medium text-verdict-stop">These parts follow different finish systems: record them as separate coats.</p>}
      <DenibFirstNote parts={coat.chosen.filter((part) => needsDenibFirst(part, step?.position, coat.work))} />
      <CoatMaterialFields control={control} register={register} errors={formState.errors} steps={coat.steps} partsChosen={coat.chosen.length > 0} product={product} mixes={coat.productMixes} units={units} timeZone={timeZone} />
      <div>
        <h3 className="mb-2 text-lg font-semibold">Conditions as sprayed</h3>
        <CoatConditionFields control={control} errors={formState.errors} units={units} />
      </div>
      <CoatPreviewPanel preview={preview} product={product} step={step} thinningPct={values.thinningPct ?? 0} units={units} timeZone={timeZone} reason={stops.reason} reasonError={stops.error} onReason={stops.setReason} />
      <ReworkReasonField
        register={register}
        hasReason={Boolean(values.reworkReason)}
        likely={repeatsStep(values.partIds?.flatMap((id) => (id === undefined ? [] : [id])) ?? [], step, coat.steps, coat.work.ready, sessionCoats)}
        onClear={() => setValue('reworkReason', null)}
        error={formState.errors.reworkReason?.message}
      />
      <FieldShell label="Notes">{(c) => <textarea {...c} rows={2} className={inputClasses} {...register('notes')} />}</FieldShell>
      <Button type="submit" className="min-h-16 w-full text-xl" pending={pending} pendingText="Recording…">
        {online ? 'Record coat' : 'Record coat on this tablet'}
      </Button>
      {!online && <p className="text-center font-medium text-verdict-caution">No connection: the coat is kept on this tablet and sent by itself when the connection is back.</p>}
    </form>
  );
}
