import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

export const inputClasses =
  'block w-full min-h-touch rounded-panel border border-maple-400 bg-white px-3 py-2 text-base text-maple-900 ' +
  'aria-[invalid=true]:border-verdict-stop aria-[invalid=true]:border-2 disabled:bg-maple-100';

interface FieldShellProps {
  label: string;
  hint?: string;
  error?: string;
  unit?: string;
  className?: string;
  children: (control: { id: string; 'aria-describedby'?: string; 'aria-invalid': boolean }) => ReactNode;
}

/** Label, control, hint and error in one place; the error is tied to the control for screen readers. */
export function FieldShell({ label, hint, error, unit, className = '', children }: FieldShellProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block font-medium text-maple-900">
        {label}
        {unit && <span className="font-normal text-maple-700"> ({unit})</span>}
      </label>
      {children({ id, 'aria-describedby': describedBy, 'aria-invalid': Boolean(error) })}
      {hint && (
        <p id={hintId} className="mt-1 text-sm text-maple-700">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="mt-1 text-sm font-medium text-verdict-stop">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
    </div>
  );
}

type InputFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  hint?: string;
  error?: string;
  unit?: string;
  registration: UseFormRegisterReturn;
};

export function InputField({ label, hint, error, unit, registration, className, ...rest }: InputFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} unit={unit} className={className}>
      {(control) => <input className={inputClasses} {...control} {...rest} {...registration} />}
    </FieldShell>
  );
}

type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  hint?: string;
  error?: string;
  registration: UseFormRegisterReturn;
  options: ReadonlyArray<{ value: string | number; label: string }>;
};

export function SelectField({ label, hint, error, registration, options, className, ...rest }: SelectFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select className={inputClasses} {...control} {...rest} {...registration}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </FieldShell>
  );
}

/** Number inputs: an empty box means "not given" (undefined) so the schema's message or default applies. */
export const asNumber = (value: unknown): number | undefined => (value === '' || value === null || value === undefined ? undefined : Number(value));

/** Optional numbers that the schema allows to be null (e.g. a measured time not yet measured). */
export const asNumberOrNull = (value: unknown): number | null => (value === '' || value === null || value === undefined ? null : Number(value));

export function FormAlert({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <div role="alert" className="mb-4 rounded-panel border-2 border-verdict-stop bg-white p-3 font-medium text-verdict-stop">
      {message}
    </div>
  );
}
