import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createFilterChangeSchema, createGaugeReadingSchema, type FilterBank } from '../../../../shared/schemas/upkeep';
import { asNumber, asNumberOrNull, FieldShell, FormAlert, InputField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRecordFilterChange } from '../../../api/upkeep/record-filter-change';
import { useRecordGaugeReading } from '../../../api/upkeep/record-gauge-reading';
import { FormActions } from './form-actions';

const pressure = { type: 'number', inputMode: 'numeric', step: 'any' } as const;

/** What the gauge of one bank reads now. */
export function GaugeReadingForm({ bank, onDone }: { bank: FilterBank; onDone: () => void }) {
  const record = useRecordGaugeReading();
  const [formError, setFormError] = useState<string | null>(null);
  type Input = z.input<typeof createGaugeReadingSchema>;
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Input, unknown, z.output<typeof createGaugeReadingSchema>>({
    resolver: zodResolver(createGaugeReadingSchema),
    defaultValues: { filterBankId: bank.id },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await record.mutateAsync(values);
      toast.success(`Reading of ${values.pressureDropPa} Pa recorded for ${bank.name}.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['pressureDropPa', 'at']));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <InputField {...pressure} autoFocus label="Gauge reads" unit="Pa" hint={`Change at ${bank.changeAtPa} Pa.`} error={errors.pressureDropPa?.message} registration={register('pressureDropPa', { setValueAs: asNumber })} />
      <FormActions onCancel={onDone} pending={record.isPending} saveText="Record reading" />
    </form>
  );
}

/** Filters of one bank changed just now: the gauge before and after, and anything worth noting. */
export function FilterChangeForm({ bank, onDone }: { bank: FilterBank; onDone: () => void }) {
  const record = useRecordFilterChange();
  const [formError, setFormError] = useState<string | null>(null);
  type Input = z.input<typeof createFilterChangeSchema>;
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Input, unknown, z.output<typeof createFilterChangeSchema>>({
    resolver: zodResolver(createFilterChangeSchema),
    defaultValues: { filterBankId: bank.id, beforePa: bank.currentPa, afterPa: null, notes: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await record.mutateAsync(values);
      toast.success(`Filter change logged for ${bank.name}.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['beforePa', 'afterPa', 'notes', 'changedAt']));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField {...pressure} label="Gauge before" unit="Pa" hint="Leave empty if not read." error={errors.beforePa?.message} registration={register('beforePa', { setValueAs: asNumberOrNull })} />
        <InputField {...pressure} label="Gauge after" unit="Pa" hint="With the new filters in and the fan running." error={errors.afterPa?.message} registration={register('afterPa', { setValueAs: asNumberOrNull })} />
      </div>
      <FieldShell label="Notes" error={errors.notes?.message} className="mt-4">
        {(control) => <textarea rows={2} className={inputClasses} {...control} {...register('notes')} />}
      </FieldShell>
      <FormActions onCancel={onDone} pending={record.isPending} saveText="Log filter change" />
    </form>
  );
}
