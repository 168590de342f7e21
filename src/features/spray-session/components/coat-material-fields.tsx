import { Controller, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { Mix } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { mixWords, thinningRangeWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { asNumberOrNull, SelectField } from '../../../components/ui/field';
import type { CoatEntryInput } from '../hooks/use-coat-form';
import { coatStepWords, type CoatStep } from '../utils/session-plan';
import { StepperField } from './stepper-field';

interface CoatMaterialFieldsProps {
  control: Control<CoatEntryInput>;
  register: UseFormRegister<CoatEntryInput>;
  errors: FieldErrors<CoatEntryInput>;
  steps: CoatStep[];
  /** No parts chosen yet: the steps come from the parts' finish system, so there are none to offer. */
  partsChosen: boolean;
  product: Product | undefined;
  mixes: Mix[];
  units: UnitSystem;
  timeZone: string;
}

const numberOrNull = { setValueAs: asNumberOrNull };

export function CoatMaterialFields({ control, register, errors, steps, partsChosen, product, mixes, units, timeZone }: CoatMaterialFieldsProps) {
  const shop = { ...useShopFormat(), timeZone };
  const stepOptions = [{ value: '', label: steps.length ? 'Choose the coat…' : partsChosen ? 'No finish system for these parts' : 'Choose the parts first' }, ...steps.map((s) => ({ value: s.position, label: coatStepWords(s, steps, units) }))];
  const mixOptions = [{ value: '', label: mixes.length ? 'No recorded mix' : 'No mix of this product recorded' }, ...mixes.map((m) => ({ value: m.id, label: `${mixWords({ productName: m.productName, mixedAt: new Date(m.mixedAt) }, shop)}, ${m.totalL.toFixed(2)} L` }))];
  const lotOptions = [{ value: '', label: 'Lot not recorded' }, ...(product?.lots ?? []).map((lot) => ({ value: lot.id, label: `${lot.lotNumber}${lot.expired ? ` (EXPIRED ${lot.expiresOn})` : ''}` }))];
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <SelectField label="Coat" className="md:col-span-2" options={stepOptions} error={errors.stepPosition?.message} registration={register('stepPosition', numberOrNull)} />
      <SelectField label="Mix (pot)" options={mixOptions} error={errors.mixId?.message} registration={register('mixId', numberOrNull)} disabled={!product} />
      <SelectField label="Product lot" options={lotOptions} error={errors.lotId?.message} registration={register('lotId', numberOrNull)} disabled={!product} />
      <Controller
        control={control}
        name="thinningPct"
        render={({ field }) => (
          <StepperField
            label="Thinning"
            unit="%"
            units={units}
            step={1}
            min={0}
            max={100}
            digits={1}
            value={field.value}
            onChange={(v) => field.onChange(v ?? 0)}
            hint={product ? `Data sheet: ${thinningRangeWords(product)}` : undefined}
            error={errors.thinningPct?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="wetFilmUm"
        render={({ field }) => (
          <StepperField
            label="Wet film reading"
            quantity="filmThickness"
            units={units}
            step={units === 'us' ? 0.5 : 5}
            min={0}
            value={field.value}
            onChange={field.onChange}
            hint="From the comb, straight after spraying. Leave empty if not measured."
            error={errors.wetFilmUm?.message}
          />
        )}
      />
    </div>
  );
}

export function CoatConditionFields({ control, errors, units }: Pick<CoatMaterialFieldsProps, 'control' | 'errors' | 'units'>) {
  const temperatureStep = units === 'us' ? 1 : 0.5;
  return (
    <div className="grid gap-4 md:grid-cols-3">
      <Controller control={control} name="airTempC" render={({ field }) => <StepperField label="Air temperature" quantity="temperature" units={units} step={temperatureStep} value={field.value} onChange={field.onChange} error={errors.airTempC?.message} />} />
      <Controller
        control={control}
        name="relativeHumidityPct"
        render={({ field }) => <StepperField label="Relative humidity" unit="%" units={units} step={1} min={1} max={100} digits={0} value={field.value} onChange={field.onChange} error={errors.relativeHumidityPct?.message} />}
      />
      <Controller control={control} name="surfaceTempC" render={({ field }) => <StepperField label="Surface temperature" quantity="temperature" units={units} step={temperatureStep} value={field.value} onChange={field.onChange} error={errors.surfaceTempC?.message} />} />
    </div>
  );
}
