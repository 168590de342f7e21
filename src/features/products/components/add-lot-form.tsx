import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createLotSchema } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { FormAlert, InputField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAddLot } from '../../../api/products/add-lot';

type LotInput = z.input<typeof createLotSchema>;
type LotOutput = z.output<typeof createLotSchema>;

const lotFieldNames = Object.keys(createLotSchema.shape);
/** A date box left empty means the tin carries no expiry date. */
const emptyAsNull = (value: unknown) => (value === '' ? null : value);

export function AddLotForm({ productId }: { productId: number }) {
  const addLot = useAddLot();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<LotInput, unknown, LotOutput>({ resolver: zodResolver(createLotSchema), defaultValues: { lotNumber: '', expiresOn: null } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const lot = await addLot.mutateAsync({ productId, input: values });
      toast.success(`Lot ${lot.lotNumber} is recorded.`);
      reset();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, lotFieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a lot" className="mt-4 border-t border-maple-200 pt-4">
      <h3 className="mb-2 font-semibold">Add a lot</h3>
      <FormAlert message={formError} />
      <div className="grid gap-3">
        <InputField label="Lot number" error={errors.lotNumber?.message} registration={register('lotNumber')} autoComplete="off" />
        <InputField type="date" label="Expires on" hint="Empty if the tin has no expiry date." error={errors.expiresOn?.message} registration={register('expiresOn', { setValueAs: emptyAsNull })} />
      </div>
      <Button type="submit" className="mt-3" pending={addLot.isPending} pendingText="Adding…">
        Add lot
      </Button>
    </form>
  );
}
