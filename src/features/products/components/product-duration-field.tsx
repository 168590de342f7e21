import { Controller, get, useFormContext, type Path } from 'react-hook-form';
import { FieldShell } from '../../../components/ui/field';
import { DurationInput } from './duration-input';
import type { ProductFormInput } from './product-form-values';

interface ProductDurationFieldProps {
  name: Path<ProductFormInput>;
  label: string;
  hint?: string;
  /** Optional times send null for an empty box; required ones send nothing, so the schema's message shows. */
  optional?: boolean;
}

/** A data-sheet time stored in minutes, typed in minutes or hours as the sheet gives it. */
export function ProductDurationField({ name, label, hint, optional = false }: ProductDurationFieldProps) {
  const {
    control,
    formState: { errors },
  } = useFormContext<ProductFormInput>();
  const error = get(errors, name) as { message?: string } | undefined;
  return (
    <FieldShell label={label} hint={hint} error={error?.message}>
      {(shell) => (
        <Controller
          control={control}
          name={name}
          render={({ field }) => (
            <DurationInput
              id={shell.id}
              describedBy={shell['aria-describedby']}
              invalid={shell['aria-invalid']}
              value={field.value as number | null | undefined}
              onChange={field.onChange}
              onBlur={field.onBlur}
              unitLabel={`${label} unit`}
              blank={optional ? null : undefined}
              layout="row"
            />
          )}
        />
      )}
    </FieldShell>
  );
}
