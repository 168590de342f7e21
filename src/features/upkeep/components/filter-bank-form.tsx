import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createFilterBankSchema, filterBankKindLabels, filterBankKinds, type FilterBank } from '../../../../shared/schemas/upkeep';
import { asNumber, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateFilterBank } from '../../../api/upkeep/create-filter-bank';
import { useUpdateFilterBank } from '../../../api/upkeep/update-filter-bank';
import { FormActions } from './form-actions';

type Input = z.input<typeof createFilterBankSchema>;
type Output = z.output<typeof createFilterBankSchema>;
const fieldNames = Object.keys(createFilterBankSchema.shape);
const kindOptions = filterBankKinds.map((kind) => ({ value: kind, label: filterBankKindLabels[kind] }));

/** Add a bank of filters to a booth, or change one: its name, kind, change-at pressure drop, and whether it is still fitted. */
export function FilterBankForm({ boothId, bank, onDone }: { boothId: number; bank?: FilterBank; onDone: () => void }) {
  const create = useCreateFilterBank();
  const update = useUpdateFilterBank();
  const [formError, setFormError] = useState<string | null>(null);
  const defaults: Input = bank ? { boothId, name: bank.name, kind: bank.kind, changeAtPa: bank.changeAtPa, active: bank.active } : { boothId, name: '', kind: 'paint-arrestor', changeAtPa: 250, active: true };
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Input, unknown, Output>({ resolver: zodResolver(createFilterBankSchema), defaultValues: defaults });

  const onSubmit = handleSubmit(async ({ boothId: _booth, ...fields }) => {
    setFormError(null);
    try {
      if (bank) await update.mutateAsync({ id: bank.id, changes: fields });
      else await create.mutateAsync({ boothId, ...fields });
      toast.success(bank ? `Filter bank “${fields.name}” is updated.` : `Filter bank “${fields.name}” is added.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField label="Name" hint="Where it is, e.g. “Arrestor pads, back wall”." error={errors.name?.message} registration={register('name')} />
        <SelectField label="Kind of filter" options={kindOptions} error={errors.kind?.message} registration={register('kind')} />
        <InputField
          type="number"
          inputMode="numeric"
          step={1}
          label="Change at"
          unit="Pa"
          hint="The pressure drop at which the booth or filter maker says to change them."
          error={errors.changeAtPa?.message}
          registration={register('changeAtPa', { setValueAs: asNumber })}
        />
        {bank && (
          <label className="flex min-h-touch items-center gap-3 self-end">
            <input type="checkbox" className="size-5 accent-lacquer-700" {...register('active')} />
            <span>Still fitted (untick to retire the bank; its record stays)</span>
          </label>
        )}
      </div>
      <FormActions onCancel={onDone} pending={create.isPending || update.isPending} saveText={bank ? 'Save changes' : 'Add filter bank'} />
    </form>
  );
}
