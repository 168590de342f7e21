import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { SignedInUser } from '../../../../shared/schemas/auth';
import { notifyPrefsOf } from '../../../../shared/schemas/notification';
import { updateMeSchema, type UpdateMeInput } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { FormAlert, InputField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateMe } from '../../../api/auth/update-me';
import { NotifyPrefsFieldset } from './notify-prefs-fieldset';
import { RecentNotifications } from './recent-notifications';

const unitChoices = [
  { value: 'metric', label: 'Metric', example: '°C, µm, m², litres, m³/h' },
  { value: 'us', label: 'US customary', example: '°F, mils, ft², US gallons, cfm' },
] as const;

function formValues(user: SignedInUser): UpdateMeInput {
  return { name: user.name, units: user.units, notify: notifyPrefsOf(user.role, user.notify) };
}

/** The user's own settings, then what the app has e-mailed them lately (times in `timeZone` when given). */
export function PreferencesForm({ user, timeZone }: { user: SignedInUser; timeZone?: string }) {
  const updateMe = useUpdateMe();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isDirty },
    reset,
  } = useForm<UpdateMeInput>({ resolver: zodResolver(updateMeSchema), defaultValues: formValues(user) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = await updateMe.mutateAsync(values);
      reset(formValues(saved));
      toast.success('Your preferences are saved.');
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'units', 'notify']));
    }
  });

  return (
    <div className="space-y-10">
      <form onSubmit={onSubmit} noValidate className="max-w-xl space-y-5">
        <FormAlert message={formError} />
        <InputField label="Your name" autoComplete="name" error={errors.name?.message} registration={register('name')} />
        <fieldset>
          <legend className="mb-2 font-medium">Units shown to you</legend>
          <div className="space-y-2">
            {unitChoices.map((choice) => (
              <label key={choice.value} className="flex min-h-touch cursor-pointer items-center gap-3 rounded-panel border border-maple-300 bg-white px-3 py-2 has-checked:border-lacquer-600 has-checked:bg-lacquer-50">
                <input type="radio" value={choice.value} className="size-5 accent-lacquer-700" {...register('units')} />
                <span>
                  <span className="font-semibold">{choice.label}</span>
                  <span className="block text-sm text-maple-700">{choice.example}</span>
                </span>
              </label>
            ))}
          </div>
          {errors.units?.message && <p className="mt-1 text-sm text-verdict-stop">{errors.units.message}</p>}
        </fieldset>
        <NotifyPrefsFieldset register={register} />
        <Button type="submit" pending={updateMe.isPending} pendingText="Saving…" disabled={!isDirty}>
          Save preferences
        </Button>
      </form>
      <RecentNotifications timeZone={timeZone} />
    </div>
  );
}
