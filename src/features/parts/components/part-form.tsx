import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { createPartSchema, type Part } from '../../../../shared/schemas/part';
import { Button } from '../../../components/ui/button';
import { asNumber, FormAlert, InputField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreatePart } from '../../../api/parts/create-part';
import { useUpdatePart } from '../../../api/parts/update-part';
import { CoatedSurfaces, RackPlace, type PartFormInput, type PartFormOutput, type RackChoice } from './part-form-fields';

const fieldNames = Object.keys(createPartSchema.shape);

function startingValues(part?: Part): DefaultValues<PartFormInput> {
  if (!part) return { label: '', kind: '', quantity: 1, faces: 'both', edges: true, rackId: null, shelf: null };
  const { label, kind, lengthMm, widthMm, thicknessMm, quantity, faces, edges, rackId, shelf } = part;
  return { label, kind, lengthMm, widthMm, thicknessMm, quantity, faces, edges, rackId, shelf };
}

interface PartFormProps {
  jobId: number;
  part?: Part;
  racks: RackChoice[];
  units: UnitSystem;
  onDone: (saved?: Part) => void;
}

/** Adds a part to the job, or edits the one given. Sizes are in mm, as cut lists give them. */
export function PartForm({ jobId, part, racks, units, onDone }: PartFormProps) {
  const createPart = useCreatePart();
  const updatePart = useUpdatePart();
  const [formError, setFormError] = useState<string | null>(null);
  const { control, register, handleSubmit, setError, setValue, formState: { errors } } = useForm<PartFormInput, unknown, PartFormOutput>({
    resolver: zodResolver(createPartSchema),
    defaultValues: startingValues(part),
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = part ? await updatePart.mutateAsync({ id: part.id, changes: values }) : await createPart.mutateAsync({ jobId, input: values });
      toast.success(part ? `Part “${saved.label}” is updated.` : `Part “${saved.label}” is added, tag ${saved.tag}.`);
      onDone(saved);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  const number = { type: 'number', inputMode: 'decimal', step: 'any' } as const;
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid grid-cols-2 gap-4">
        <InputField className="col-span-2 sm:col-span-1" label="Label" hint="As written on the part or the cut list, e.g. Door 3." error={errors.label?.message} registration={register('label')} />
        <InputField className="col-span-2 sm:col-span-1" label="Kind" hint="e.g. door, drawer side, panel." error={errors.kind?.message} registration={register('kind')} />
        <InputField {...number} label="Length" unit="mm" error={errors.lengthMm?.message} registration={register('lengthMm', { setValueAs: asNumber })} />
        <InputField {...number} label="Width" unit="mm" error={errors.widthMm?.message} registration={register('widthMm', { setValueAs: asNumber })} />
        <InputField {...number} label="Thickness" unit="mm" error={errors.thicknessMm?.message} registration={register('thicknessMm', { setValueAs: asNumber })} />
        <InputField type="number" inputMode="numeric" step={1} label="Quantity" unit="pieces" error={errors.quantity?.message} registration={register('quantity', { setValueAs: asNumber })} />
        <CoatedSurfaces control={control} register={register} units={units} />
        <RackPlace control={control} register={register} setValue={setValue} errors={errors} racks={racks} />
      </div>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={() => onDone()}>
          Cancel
        </Button>
        <Button type="submit" pending={createPart.isPending || updatePart.isPending} pendingText="Saving…">
          {part ? 'Save changes' : 'Save part'}
        </Button>
      </div>
    </form>
  );
}
