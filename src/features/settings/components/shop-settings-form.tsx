import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { shopSettingsSchema, type ShopSettings } from '../../../../shared/schemas/settings';
import { Button } from '../../../components/ui/button';
import { asNumber, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { listTimeZones } from '../../../lib/shop-time';
import { useUpdateShopSettings } from '../../../api/settings/update-settings';
import { currencyChoices, localeChoices, withSaved } from './shop-format-options';

const fieldNames = Object.keys(shopSettingsSchema.shape);
const unitOptions = [
  { value: 'metric', label: 'Metric' },
  { value: 'us', label: 'US customary' },
];
const hourOptions = Array.from({ length: 24 }, (_, hour) => ({ value: hour, label: `${String(hour).padStart(2, '0')}:00` }));

export function ShopSettingsForm({ settings }: { settings: ShopSettings }) {
  const update = useUpdateShopSettings();
  const [formError, setFormError] = useState<string | null>(null);
  const zones = useMemo(() => {
    const all = listTimeZones();
    return (all.includes(settings.timezone) ? all : [settings.timezone, ...all]).map((zone) => ({ value: zone, label: zone }));
  }, [settings.timezone]);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<ShopSettings>({ resolver: zodResolver(shopSettingsSchema), defaultValues: settings });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      reset(await update.mutateAsync(values));
      toast.success('Shop settings are saved.');
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  const number = { type: 'number', inputMode: 'decimal', step: 'any' } as const;
  const whole = { type: 'number', inputMode: 'numeric', step: 1 } as const;

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid max-w-3xl gap-4 sm:grid-cols-2">
        <InputField label="Shop name" error={errors.shopName?.message} registration={register('shopName')} />
        <SelectField label="Timezone" hint="Every time in Boothwright is shown in this zone." options={zones} error={errors.timezone?.message} registration={register('timezone')} />
        <SelectField
          label="Language and region"
          hint="How dates, times, numbers and money are written."
          options={withSaved(localeChoices, settings.locale)}
          error={errors.locale?.message}
          registration={register('locale')}
        />
        <SelectField label="Currency" hint="Prices on the data sheets and costs on estimates are in this currency." options={withSaved(currencyChoices, settings.currency)} error={errors.currency?.message} registration={register('currency')} />
        <SelectField label="Units for new users" options={unitOptions} error={errors.defaultUnits?.message} registration={register('defaultUnits')} />
        <InputField
          {...number}
          label="Expected drying temperature"
          unit="°C"
          hint="Used to plan drying times when no reading is known."
          error={errors.planningDryingTempC?.message}
          registration={register('planningDryingTempC', { setValueAs: asNumber })}
        />
        <InputField {...whole} label="Set-up per spray session" unit="min" error={errors.setupMin?.message} registration={register('setupMin', { setValueAs: asNumber })} />
        <InputField {...whole} label="Clean-down per spray session" unit="min" error={errors.cleanDownMin?.message} registration={register('cleanDownMin', { setValueAs: asNumber })} />
        <InputField
          {...number}
          label="Yearly solvent threshold"
          unit="kg"
          hint="The emissions report warns as the year's solvent use nears this."
          error={errors.yearlySolventThresholdKg?.message}
          registration={register('yearlySolventThresholdKg', { setValueAs: asNumber })}
        />
        <SelectField
          label="Daily plan sent at"
          options={hourOptions}
          error={errors.dailyPlanHour?.message}
          registration={register('dailyPlanHour', { setValueAs: Number })}
        />
      </div>
      <fieldset className="mt-8 max-w-3xl">
        <legend className="text-lg font-semibold">Booth upkeep and crew protection</legend>
        <p className="mb-3 text-maple-700">
          How often each falls due, counted from the day it was done, and how far ahead Boothwright warns. The 14-month extraction test follows UK HSE guidance (HSG258); the
          other defaults are common practice, with no published source found. Your local regulations and the booth and equipment makers’ instructions come first: set these to match them.
        </p>
        <div className="grid gap-4 sm:grid-cols-2">
          <InputField {...whole} label="Extraction test every" unit="months" error={errors.extractionTestMonths?.message} registration={register('extractionTestMonths', { setValueAs: asNumber })} />
          <InputField {...whole} label="Fire-protection inspection every" unit="months" error={errors.fireInspectionMonths?.message} registration={register('fireInspectionMonths', { setValueAs: asNumber })} />
          <InputField {...whole} label="Face-fit test every" unit="months" error={errors.fitTestMonths?.message} registration={register('fitTestMonths', { setValueAs: asNumber })} />
          <InputField {...whole} label="Health surveillance every" unit="months" hint="For isocyanate work." error={errors.healthSurveillanceMonths?.message} registration={register('healthSurveillanceMonths', { setValueAs: asNumber })} />
          <InputField {...whole} label="Warn when due within" unit="days" error={errors.upkeepDueSoonDays?.message} registration={register('upkeepDueSoonDays', { setValueAs: asNumber })} />
        </div>
      </fieldset>
      <Button type="submit" className="mt-6" pending={update.isPending} pendingText="Saving…" disabled={!isDirty}>
        Save shop settings
      </Button>
    </form>
  );
}
