import { get, useFormContext, type Path } from 'react-hook-form';
import { asNumber, asNumberOrNull, InputField } from '../../../components/ui/field';
import type { ProductFormInput } from './product-form-values';

interface ProductNumberFieldProps {
  name: Path<ProductFormInput>;
  label: string;
  unit?: string;
  hint?: string;
  /** Optional fields send null for an empty box; required ones send nothing, so the schema's message shows. */
  optional?: boolean;
  className?: string;
}

export function ProductNumberField({ name, label, unit, hint, optional = false, className }: ProductNumberFieldProps) {
  const {
    register,
    formState: { errors },
  } = useFormContext<ProductFormInput>();
  const error = get(errors, name) as { message?: string } | undefined;
  return (
    <InputField
      type="number"
      inputMode="decimal"
      step="any"
      label={label}
      unit={unit}
      hint={hint}
      className={className}
      error={error?.message}
      registration={register(name, { setValueAs: optional ? asNumberOrNull : asNumber })}
    />
  );
}
