import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createRackSchema, rackLocationLabels, rackLocations, type Rack } from '../../../../shared/schemas/rack';
import { Button } from '../../../components/ui/button';
import { asNumber, asNumberOrNull, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateRack } from '../../../api/racks/create-rack';
import { useUpdateRack } from '../../../api/racks/update-rack';

type RackFormInput = z.input<typeof createRackSchema>;
type RackFormOutput = z.output<typeof createRackSchema>;

const fieldNames = Object.keys(createRackSchema.shape);
const locationOptions = rackLocations.map((location) => ({ value: location, label: rackLocationLabels[location] }));

/** The sites an admin of several may put the rack on; left out, the server keeps it on the user's own. */
export interface RackSiteChoice {
  options: ReadonlyArray<{ value: number; label: string }>;
  defaultSiteId: number;
}

function startingValues(rack?: Rack, siteChoice?: RackSiteChoice): DefaultValues<RackFormInput> {
  const site = siteChoice ? { siteId: rack?.siteId ?? siteChoice.defaultSiteId } : {};
  if (!rack) return { name: '', location: 'drying-room', shelves: 10, shelfAreaM2: 1, dryingTempC: null, ...site };
  const { name, location, shelves, shelfAreaM2, dryingTempC } = rack;
  return { name, location, shelves, shelfAreaM2, dryingTempC, ...site };
}

export function RackForm({ rack, siteChoice, onDone }: { rack?: Rack; siteChoice?: RackSiteChoice; onDone: () => void }) {
  const createRack = useCreateRack();
  const updateRack = useUpdateRack();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<RackFormInput, unknown, RackFormOutput>({ resolver: zodResolver(createRackSchema), defaultValues: startingValues(rack, siteChoice) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = rack ? await updateRack.mutateAsync({ id: rack.id, changes: values }) : await createRack.mutateAsync(values);
      toast.success(rack ? `Rack “${saved.name}” is updated.` : `Rack “${saved.name}” is added.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  const number = { type: 'number', inputMode: 'decimal', step: 'any' } as const;

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField label="Name" error={errors.name?.message} registration={register('name')} />
        <SelectField label="Where it stands" options={locationOptions} error={errors.location?.message} registration={register('location')} />
        {siteChoice && (
          <SelectField label="Site" options={siteChoice.options} error={errors.siteId?.message} registration={register('siteId', { setValueAs: asNumber })} />
        )}
        <InputField
          type="number"
          inputMode="numeric"
          step={1}
          label="Shelves"
          error={errors.shelves?.message}
          registration={register('shelves', { setValueAs: asNumber })}
        />
        <InputField
          {...number}
          label="Usable area per shelf"
          unit="m²"
          error={errors.shelfAreaM2?.message}
          registration={register('shelfAreaM2', { setValueAs: asNumber })}
        />
        <InputField
          {...number}
          label="Drying temperature"
          unit="°C"
          hint="Only when the drying room is heated; leave empty for unheated."
          error={errors.dryingTempC?.message}
          registration={register('dryingTempC', { setValueAs: asNumberOrNull })}
        />
      </div>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={createRack.isPending || updateRack.isPending} pendingText="Saving…">
          {rack ? 'Save changes' : 'Save rack'}
        </Button>
      </div>
    </form>
  );
}
