import { useFormContext } from 'react-hook-form';
import { hazardLabels, hazards } from '../../../../shared/schemas/product';
import type { ProductFormInput } from './product-form-values';
import { ProductNumberField } from './product-number-field';
import { ProductSection } from './product-section';

function HazardChoices() {
  const {
    register,
    formState: { errors },
  } = useFormContext<ProductFormInput>();
  return (
    <fieldset className="sm:col-span-2 xl:col-span-3">
      <legend className="mb-1 font-medium">Hazards (from the safety data sheet)</legend>
      <div className="flex flex-wrap gap-x-6 gap-y-1">
        {hazards.map((hazard) => (
          <label key={hazard} className="flex min-h-touch items-center gap-2">
            <input type="checkbox" value={hazard} className="h-5 w-5 accent-lacquer-700" {...register('hazards')} />
            {hazardLabels[hazard]}
          </label>
        ))}
      </div>
      {errors.hazards?.message && <p className="mt-1 text-sm font-medium text-verdict-stop">{errors.hazards.message}</p>}
    </fieldset>
  );
}

export function ProductLimitsFields() {
  return (
    <ProductSection title="Application limits and safety" description="Leave a box empty when the data sheet does not give the figure.">
      <ProductNumberField name="minApplicationTempC" label="Lowest application temperature" unit="°C" optional />
      <ProductNumberField name="maxRelativeHumidityPct" label="Highest relative humidity" unit="%" optional />
      <ProductNumberField name="referenceRhPct" label="RH the drying times were measured at" unit="%" optional />
      <ProductNumberField name="vocGPerL" label="VOC as applied" unit="g/L" optional />
      <ProductNumberField name="flashPointC" label="Flash point" unit="°C" optional />
      <HazardChoices />
    </ProductSection>
  );
}
