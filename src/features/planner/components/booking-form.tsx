import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import type { Booth } from '../../../../shared/schemas/booth';
import { createSpraySessionSchema } from '../../../../shared/schemas/spray-session';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, inputClasses, SelectField } from '../../../components/ui/field';
import { errorMessage } from '../../../lib/error-messages';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateSpraySession } from '../../../api/spray-sessions/create-spray-session';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { needsOverrideReason } from '../utils/booking-errors';
import { sessionWhen } from '../utils/session-time';
import { DurationSuggestion } from './duration-suggestion';
import { OverrideReasonPanel } from './override-reason-panel';
import { PlanPartsFields, type PartsPlan } from './plan-parts-fields';
import { ShopTimeField } from './shop-time-field';
import { SprayerField, type SprayerViewer } from './sprayer-field';

type BookingInput = z.input<typeof createSpraySessionSchema>;
type BookingOutput = z.output<typeof createSpraySessionSchema>;

export type BookingTarget = { kind: 'new'; start: string; end: string; boothId: number | null } | { kind: 'edit'; session: SpraySession };
export interface PlanningSettings {
  timezone: string;
  setupMin: number;
  cleanDownMin: number;
}

const fieldNames = Object.keys(createSpraySessionSchema.shape);
const idOrNull = (value: unknown) => (value === '' || value === null || value === undefined ? null : Number(value));

function startingValues(target: BookingTarget, booths: Booth[]): DefaultValues<BookingInput> {
  if (target.kind === 'edit') {
    const { boothId, start, end, sprayerId, notes, items } = target.session;
    return { boothId, start, end, sprayerId, notes, items, override: null };
  }
  return { boothId: target.boothId ?? booths[0]?.id, start: target.start, end: target.end, sprayerId: null, notes: '', items: [], override: null };
}

interface BookingFormProps {
  target: BookingTarget;
  booths: Booth[];
  settings: PlanningSettings;
  viewer: SprayerViewer;
  onDone: (saved: SpraySession | null) => void;
}

/** Book a session, or change one: booth, times on the shop clock, sprayer, parts and notes. */
export function BookingForm({ target, booths, settings, viewer, onDone }: BookingFormProps) {
  const createSession = useCreateSpraySession();
  const updateSession = useUpdateSpraySession();
  const [formError, setFormError] = useState<string | null>(null);
  const [overrideAsked, setOverrideAsked] = useState<string | null>(null);
  const [plannedArea, setPlannedArea] = useState(0);
  const { control, register, handleSubmit, setError, setValue, formState } = useForm<BookingInput, unknown, BookingOutput>({
    resolver: zodResolver(createSpraySessionSchema),
    defaultValues: startingValues(target, booths),
  });
  const { errors } = formState;
  const [boothId, start] = useWatch({ control, name: ['boothId', 'start'] });
  const originalItems = target.kind === 'edit' ? target.session.items : [];

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = target.kind === 'edit' ? await updateSession.mutateAsync({ id: target.session.id, changes: values }) : await createSession.mutateAsync(values);
      toast.success(`${target.kind === 'edit' ? 'Changed' : 'Booked'}: ${saved.boothName}, ${sessionWhen(saved, settings.timezone)}.`);
      onDone(saved);
    } catch (error) {
      if (needsOverrideReason(error) && !values.override) {
        setOverrideAsked(errorMessage(error));
        setValue('override', { reason: '' });
        return;
      }
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });
  const backFromOverride = () => {
    setOverrideAsked(null);
    setValue('override', null);
  };
  const plan = (next: PartsPlan | null) => {
    setValue('items', next?.items ?? originalItems);
    setPlannedArea(next?.areaM2 ?? 0);
  };

  const pending = createSession.isPending || updateSession.isPending;
  const submitLabel = target.kind === 'edit' ? 'Save changes' : 'Book session';
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <p className="mb-3 text-sm text-maple-700">Times are on the shop’s clock ({settings.timezone}).</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Booth"
          className="sm:col-span-2"
          options={booths.map((booth) => ({ value: booth.id, label: booth.name }))}
          error={errors.boothId?.message}
          registration={register('boothId', { setValueAs: Number })}
        />
        <ShopTimeField control={control} name="start" label="Starts" timeZone={settings.timezone} error={errors.start?.message} />
        <ShopTimeField control={control} name="end" label="Ends" timeZone={settings.timezone} error={errors.end?.message} />
        <SprayerField
          boothId={Number(boothId) || undefined}
          viewer={viewer}
          current={target.kind === 'edit' ? target.session : undefined}
          className="sm:col-span-2"
          error={errors.sprayerId?.message}
          registration={register('sprayerId', { setValueAs: idOrNull })}
        />
        <PlanPartsFields onPlan={plan} keeping={originalItems.length} />
        <DurationSuggestion
          areaM2={plannedArea}
          booth={booths.find((booth) => booth.id === Number(boothId))}
          setupMin={settings.setupMin}
          cleanDownMin={settings.cleanDownMin}
          start={start ?? ''}
          timeZone={settings.timezone}
          onUseEnd={(end) => setValue('end', end, { shouldValidate: true })}
        />
        {errors.items && <p className="text-sm font-medium text-verdict-stop sm:col-span-2">{errors.items.message ?? 'Check the chosen parts'}</p>}
        <FieldShell label="Notes" hint="For the sprayer: masking, order of parts, anything unusual." error={errors.notes?.message} className="sm:col-span-2">
          {(shell) => <textarea {...shell} rows={3} className={inputClasses} {...register('notes')} />}
        </FieldShell>
      </div>
      {overrideAsked ? (
        <OverrideReasonPanel
          message={overrideAsked}
          registration={register('override.reason')}
          error={errors.override?.reason?.message ?? errors.override?.message}
          pending={pending}
          confirmLabel={target.kind === 'edit' ? 'Save anyway' : 'Book anyway'}
          onBack={backFromOverride}
        />
      ) : (
        <div className="mt-6 flex flex-wrap justify-end gap-3">
          <Button variant="secondary" onClick={() => onDone(null)}>
            Cancel
          </Button>
          <Button type="submit" pending={pending} pendingText="Saving…">
            {submitLabel}
          </Button>
        </div>
      )}
    </form>
  );
}
