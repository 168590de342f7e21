import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { meanFaceVelocityMps } from '../../../../shared/finishing/upkeep-due';
import { createExtractionTestSchema } from '../../../../shared/schemas/upkeep';
import { Button } from '../../../components/ui/button';
import { asNumber, asNumberOrNull, FieldShell, FormAlert, InputField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRecordExtractionTest } from '../../../api/upkeep/record-extraction-test';
import { FormActions } from './form-actions';
import { speed } from './upkeep-format';

const shape = createExtractionTestSchema.shape;
/** The shared schema, with the readings as one box each (the form keeps objects in its list); boxes left empty are not readings. */
const formSchema = createExtractionTestSchema.omit({ faceVelocityPointsMps: true }).extend({
  points: z
    .array(z.object({ mps: shape.faceVelocityPointsMps.element.optional() }))
    .transform((boxes) => boxes.flatMap((box) => (box.mps === undefined ? [] : [box.mps])))
    .pipe(shape.faceVelocityPointsMps),
});
type Input = z.input<typeof formSchema>;
type Output = z.output<typeof formSchema>;
// A server message about the readings has no one box to sit beside, so it shows above the form.
const fieldNames = Object.keys(formSchema.shape);

interface ExtractionTestFormProps {
  boothId: number;
  minFaceVelocityMps: number;
  intervalMonths: number;
  today: string;
  onDone: () => void;
}

function LiveMean({ points, minimum }: { points: { mps?: number }[] | undefined; minimum: number }) {
  const values = (points ?? []).map((p) => p.mps).filter((v): v is number => typeof v === 'number' && Number.isFinite(v) && v >= 0);
  if (values.length === 0) return <p className="text-maple-700">The mean shows as you enter readings.</p>;
  const mean = meanFaceVelocityMps(values);
  const meets = mean >= minimum;
  return (
    <p role="status" className={`font-semibold ${meets ? 'text-verdict-go' : 'text-verdict-stop'}`}>
      Mean of {values.length} reading{values.length === 1 ? '' : 's'}: {speed(mean)} — {meets ? 'meets' : 'below'} the booth’s minimum of {speed(minimum)}
    </p>
  );
}

/** A face-velocity traverse (readings at points across the open face), the clearance time measured, who tested and when it is next due. */
export function ExtractionTestForm({ boothId, minFaceVelocityMps, intervalMonths, today, onDone }: ExtractionTestFormProps) {
  const record = useRecordExtractionTest();
  const [formError, setFormError] = useState<string | null>(null);
  const defaults: Input = { boothId, testedOn: today, points: Array.from({ length: 4 }, () => ({ mps: undefined })), clearanceMin: null, testedBy: '', nextDueOn: null, notes: '' };
  const { register, handleSubmit, setError, control, formState: { errors } } = useForm<Input, unknown, Output>({ resolver: zodResolver(formSchema), defaultValues: defaults });
  const points = useFieldArray({ control, name: 'points' });
  const watched = useWatch({ control, name: 'points' });

  const onSubmit = handleSubmit(async ({ points: readings, ...fields }) => {
    setFormError(null);
    try {
      const extractionTest = await record.mutateAsync({ ...fields, faceVelocityPointsMps: readings });
      toast.success(`Extraction test recorded: mean ${speed(extractionTest.meanFaceVelocityMps)}.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField type="date" label="Tested on" max={today} error={errors.testedOn?.message} registration={register('testedOn')} />
        <InputField label="Tested by" hint="A name, or the firm that tested." error={errors.testedBy?.message} registration={register('testedBy')} />
      </div>
      <fieldset className="mt-4">
        <legend className="font-medium">Face velocity at each point across the open face (m/s)</legend>
        <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-4">
          {points.fields.map((field, index) => (
            <InputField
              key={field.id}
              type="number"
              inputMode="decimal"
              step="any"
              label={`Point ${index + 1}`}
              error={errors.points?.[index]?.mps?.message}
              registration={register(`points.${index}.mps`, { setValueAs: asNumber })}
            />
          ))}
        </div>
        {errors.points?.message && <p className="mt-1 text-sm font-medium text-verdict-stop">{errors.points.message}</p>}
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <Button variant="secondary" onClick={() => points.append({ mps: undefined })} disabled={points.fields.length >= 50}>
            Add a point
          </Button>
          {points.fields.length > 1 && (
            <Button variant="quiet" onClick={() => points.remove(points.fields.length - 1)}>
              Remove the last point
            </Button>
          )}
        </div>
        <div className="mt-2">
          <LiveMean points={watched} minimum={minFaceVelocityMps} />
        </div>
      </fieldset>
      <div className="mt-4 grid gap-4 sm:grid-cols-2">
        <InputField type="number" inputMode="decimal" step="any" label="Clearance time measured" unit="min" hint="From the smoke test; leave empty if not measured." error={errors.clearanceMin?.message} registration={register('clearanceMin', { setValueAs: asNumberOrNull })} />
        <InputField type="date" label="Next due" hint={`Leave empty for ${intervalMonths} months from the test (the shop’s interval).`} error={errors.nextDueOn?.message} registration={register('nextDueOn', { setValueAs: (v: string) => (v ? v : null) })} />
      </div>
      <FieldShell label="Notes" error={errors.notes?.message} className="mt-4">
        {(controlProps) => <textarea rows={2} className={inputClasses} {...controlProps} {...register('notes')} />}
      </FieldShell>
      <FormActions onCancel={onDone} pending={record.isPending} saveText="Record extraction test" />
    </form>
  );
}
