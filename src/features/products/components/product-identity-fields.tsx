import { useFormContext } from 'react-hook-form';
import { chemistries, chemistryLabels, productKinds } from '../../../../shared/schemas/product';
import { InputField, SelectField } from '../../../components/ui/field';
import { productKindLabels } from './product-format';
import type { ProductFormInput } from './product-form-values';
import { ProductNumberField } from './product-number-field';
import { ProductSection } from './product-section';

const choose = { value: '', label: 'Choose…' };
const kindOptions = [choose, ...productKinds.map((kind) => ({ value: kind, label: productKindLabels[kind] }))];
const chemistryOptions = [choose, ...chemistries.map((chemistry) => ({ value: chemistry, label: chemistryLabels[chemistry] }))];
const emptyAsUnset = (value: unknown) => (value === '' ? undefined : value);

export function ProductIdentityFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<ProductFormInput>();
  return (
    <ProductSection title="Product" description="As printed on the maker’s data sheet.">
      <InputField label="Product name" error={errors.name?.message} registration={register('name')} className="sm:col-span-2" />
      <InputField label="Maker’s reference" hint="Optional." error={errors.makerRef?.message} registration={register('makerRef')} />
      <SelectField label="Kind" options={kindOptions} error={errors.kind?.message} registration={register('kind', { setValueAs: emptyAsUnset })} />
      <SelectField label="Chemistry" options={chemistryOptions} error={errors.chemistry?.message} registration={register('chemistry', { setValueAs: emptyAsUnset })} />
      <ProductNumberField name="volumeSolidsPct" label="Volume solids" unit="%" hint="Sets the dry film a wet film leaves." />
      <ProductNumberField name="densityKgPerL" label="Density" unit="kg/L" optional />
      <ProductNumberField name="dryFilmPerCoatUm" label="Dry film per coat" unit="µm" hint="The maker’s recommended dry film." optional />
      <ProductNumberField name="pricePerL" label="Price per litre" hint="As supplied, in the shop’s currency." optional />
    </ProductSection>
  );
}
