import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { correctCoatSchema, type Coat } from '../../../../shared/schemas/coat';
import { Button } from '../../../components/ui/button';
import { asNumber, asNumberOrNull, FieldShell, FormAlert, InputField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCorrectCoat } from '../../../api/coats/correct-coat';

type CorrectionInput = z.input<typeof correctCoatSchema>;
type Correction = z.output<typeof correctCoatSchema>;
const editable = ['wetFilmUm', 'thinningPct', 'airTempC', 'relativeHumidityPct', 'surfaceTempC', 'notes'] as const;
const fieldNames = [...editable, 'reason'];

/**
 * The boxes on the form and the reason; the server keeps every field a correction leaves out
 * (parts, product, step, lot, pot, when sprayed). Drying temperature goes as null so the server
 * works it out again from the racks or the corrected air temperature, as it did the first time.
 */
function correctionOf(coat: Coat, values: Correction): Correction {
  // A correction starts with no acknowledgements, so the reasons given for the first version's stops are sent again.
  const acknowledgements = coat.warnings.flatMap((w) => (w.acknowledgedReason ? [{ code: w.code, reason: w.acknowledgedReason }] : []));
  const edited = Object.fromEntries(editable.map((key) => [key, values[key]]));
  return { ...edited, dryingTempC: null, acknowledgements, reason: values.reason };
}

export function CorrectionForm({ coat, onDone }: { coat: Coat; onDone: () => void }) {
  const correct = useCorrectCoat();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<CorrectionInput, unknown, Correction>({
    resolver: zodResolver(correctCoatSchema),
    defaultValues: { reason: '', ...Object.fromEntries(editable.map((key) => [key, coat[key]])) },
  });
  const { errors } = formState;
  const number = { type: 'text', inputMode: 'decimal' } as const;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const corrected = await correct.mutateAsync({ id: coat.id, correction: correctionOf(coat, values) });
      toast.success(`Coat ${coat.id} is corrected by record ${corrected.id}. The first version stays in the history.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-4">
      <FormAlert message={formError} />
      <FieldShell label="Reason for the correction" hint="Required. Kept with the new version for anyone checking the record later." error={errors.reason?.message}>
        {(control) => <textarea {...control} rows={2} className={inputClasses} {...register('reason')} />}
      </FieldShell>
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField {...number} label="Wet film" unit="µm" hint="Empty if not measured." error={errors.wetFilmUm?.message} registration={register('wetFilmUm', { setValueAs: asNumberOrNull })} />
        <InputField {...number} label="Thinning" unit="%" error={errors.thinningPct?.message} registration={register('thinningPct', { setValueAs: asNumber })} />
        <InputField {...number} label="Air temperature" unit="°C" error={errors.airTempC?.message} registration={register('airTempC', { setValueAs: asNumber })} />
        <InputField {...number} label="Relative humidity" unit="%" error={errors.relativeHumidityPct?.message} registration={register('relativeHumidityPct', { setValueAs: asNumber })} />
        <InputField {...number} label="Surface temperature" unit="°C" error={errors.surfaceTempC?.message} registration={register('surfaceTempC', { setValueAs: asNumber })} />
      </div>
      <FieldShell label="Notes">{(control) => <textarea {...control} rows={2} className={inputClasses} {...register('notes')} />}</FieldShell>
      <div className="flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={correct.isPending} pendingText="Saving…">
          Save correction
        </Button>
      </div>
    </form>
  );
}
