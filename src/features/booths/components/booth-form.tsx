import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { boothKindLabels, boothKinds, createBoothSchema, defaultOpeningHours, type Booth } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { asNumber, asNumberOrNull, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateBooth } from '../../../api/booths/create-booth';
import { useUpdateBooth } from '../../../api/booths/update-booth';
import { OpeningHoursEditor } from './opening-hours-editor';

type BoothFormInput = z.input<typeof createBoothSchema>;
type BoothFormOutput = z.output<typeof createBoothSchema>;

const fieldNames = Object.keys(createBoothSchema.shape);
const kindOptions = boothKinds.map((kind) => ({ value: kind, label: boothKindLabels[kind] }));

/** The sites an admin of several may put the booth on; left out, the server keeps it on the user's own. */
export interface BoothSiteChoice {
  options: ReadonlyArray<{ value: number; label: string }>;
  defaultSiteId: number;
}

function startingValues(booth?: Booth, siteChoice?: BoothSiteChoice): DefaultValues<BoothFormInput> {
  const site = siteChoice ? { siteId: booth?.siteId ?? siteChoice.defaultSiteId } : {};
  return { ...fieldValues(booth), ...site };
}

function fieldValues(booth?: Booth): DefaultValues<BoothFormInput> {
  if (!booth) {
    return {
      name: '',
      kind: 'cross-draft',
      mixingFactorK: 3,
      measuredClearanceMin: null,
      minFaceVelocityMps: 0.5,
      openFaceAreaM2: null,
      openingHours: defaultOpeningHours.map((span) => ({ ...span })),
      sprayRateM2PerH: 20,
    };
  }
  const { name, kind, volumeM3, extractionM3PerH, mixingFactorK, measuredClearanceMin, minFaceVelocityMps, openFaceAreaM2, openingHours, sprayRateM2PerH } = booth;
  return { name, kind, volumeM3, extractionM3PerH, mixingFactorK, measuredClearanceMin, minFaceVelocityMps, openFaceAreaM2, openingHours, sprayRateM2PerH };
}

/** All booth fields, entered in metric (they are stored that way). Creates, or edits the booth given. */
export function BoothForm({ booth, siteChoice, onDone }: { booth?: Booth; siteChoice?: BoothSiteChoice; onDone: () => void }) {
  const createBooth = useCreateBooth();
  const updateBooth = useUpdateBooth();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    control,
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<BoothFormInput, unknown, BoothFormOutput>({ resolver: zodResolver(createBoothSchema), defaultValues: startingValues(booth, siteChoice) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = booth ? await updateBooth.mutateAsync({ id: booth.id, changes: values }) : await createBooth.mutateAsync(values);
      toast.success(booth ? `Booth “${saved.name}” is updated.` : `Booth “${saved.name}” is added.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  const pending = createBooth.isPending || updateBooth.isPending;
  const number = { type: 'number', inputMode: 'decimal', step: 'any' } as const;

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField label="Name" error={errors.name?.message} registration={register('name')} />
        <SelectField label="Kind" options={kindOptions} error={errors.kind?.message} registration={register('kind')} />
        {siteChoice && (
          <SelectField label="Site" options={siteChoice.options} error={errors.siteId?.message} registration={register('siteId', { setValueAs: asNumber })} />
        )}
        <InputField {...number} label="Internal volume" unit="m³" error={errors.volumeM3?.message} registration={register('volumeM3', { setValueAs: asNumber })} />
        <InputField
          {...number}
          label="Extraction rate"
          unit="m³/h"
          hint="Air the fan draws out, from its plate or a measurement."
          error={errors.extractionM3PerH?.message}
          registration={register('extractionM3PerH', { setValueAs: asNumber })}
        />
        <InputField
          {...number}
          label="Mixing factor K"
          hint="How evenly fresh air mixes: 1 perfect, 3 usual, up to 10 poor."
          error={errors.mixingFactorK?.message}
          registration={register('mixingFactorK', { setValueAs: asNumber })}
        />
        <InputField
          {...number}
          label="Measured clearance time"
          unit="min"
          hint="Leave empty to use the computed time."
          error={errors.measuredClearanceMin?.message}
          registration={register('measuredClearanceMin', { setValueAs: asNumberOrNull })}
        />
        <InputField
          {...number}
          label="Minimum face velocity"
          unit="m/s"
          error={errors.minFaceVelocityMps?.message}
          registration={register('minFaceVelocityMps', { setValueAs: asNumber })}
        />
        <InputField
          {...number}
          label="Open-face area"
          unit="m²"
          hint="Width × height of the open face; needed to work out face velocity."
          error={errors.openFaceAreaM2?.message}
          registration={register('openFaceAreaM2', { setValueAs: asNumberOrNull })}
        />
        <InputField
          {...number}
          label="Spray rate"
          unit="m²/h"
          hint="Area sprayed in an hour, used to plan session length."
          error={errors.sprayRateM2PerH?.message}
          registration={register('sprayRateM2PerH', { setValueAs: asNumber })}
        />
        <OpeningHoursEditor control={control} register={register} errors={errors} />
      </div>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={pending} pendingText="Saving…">
          {booth ? 'Save changes' : 'Save booth'}
        </Button>
      </div>
    </form>
  );
}
