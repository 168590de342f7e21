import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createFireInspectionSchema } from '../../../../shared/schemas/upkeep';
import { FieldShell, FormAlert, InputField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRecordFireInspection } from '../../../api/upkeep/record-fire-inspection';
import { FormActions } from './form-actions';

type Input = z.input<typeof createFireInspectionSchema>;
type Output = z.output<typeof createFireInspectionSchema>;
const fieldNames = Object.keys(createFireInspectionSchema.shape);

/** Extinguishers, suppression and interlocks inspected: by whom, whether it passed, when it is next due. */
export function FireInspectionForm({ boothId, intervalMonths, today, onDone }: { boothId: number; intervalMonths: number; today: string; onDone: () => void }) {
  const record = useRecordFireInspection();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, control, formState: { errors } } = useForm<Input, unknown, Output>({
    resolver: zodResolver(createFireInspectionSchema),
    defaultValues: { boothId, inspectedOn: today, inspectedBy: '', nextDueOn: null, notes: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await record.mutateAsync(values);
      toast.success(values.passed ? 'Fire-protection inspection recorded.' : 'Failed inspection recorded: the booth shows as not fit to spray until one passes.');
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField type="date" label="Inspected on" max={today} error={errors.inspectedOn?.message} registration={register('inspectedOn')} />
        <InputField label="Inspected by" hint="A name, or the firm." error={errors.inspectedBy?.message} registration={register('inspectedBy')} />
      </div>
      <fieldset className="mt-4">
        <legend className="font-medium">Result</legend>
        <Controller
          control={control}
          name="passed"
          render={({ field }) => (
            <div className="mt-1 flex flex-wrap gap-3">
              {[
                { value: true, label: 'Passed' },
                { value: false, label: 'Faults found' },
              ].map((option) => (
                <label key={option.label} className="flex min-h-touch cursor-pointer items-center gap-2 rounded-panel border border-maple-300 bg-white px-3 has-checked:border-lacquer-600 has-checked:bg-lacquer-50">
                  <input type="radio" name={field.name} checked={field.value === option.value} onChange={() => field.onChange(option.value)} onBlur={field.onBlur} className="size-5 accent-lacquer-700" />
                  {option.label}
                </label>
              ))}
            </div>
          )}
        />
        {errors.passed?.message && <p className="mt-1 text-sm font-medium text-verdict-stop">{errors.passed.message}</p>}
      </fieldset>
      <InputField type="date" className="mt-4" label="Next due" hint={`Leave empty for ${intervalMonths} months from the inspection (the shop’s interval).`} error={errors.nextDueOn?.message} registration={register('nextDueOn', { setValueAs: (v: string) => (v ? v : null) })} />
      <FieldShell label="Notes" error={errors.notes?.message} className="mt-4">
        {(control) => <textarea rows={2} className={inputClasses} {...control} {...register('notes')} />}
      </FieldShell>
      <FormActions onCancel={onDone} pending={record.isPending} saveText="Record inspection" />
    </form>
  );
}
