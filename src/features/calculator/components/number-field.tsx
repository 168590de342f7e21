import { FieldShell, inputClasses } from '../../../components/ui/field';

type NumberFieldProps = {
  label: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  hint?: string;
  error?: string;
  className?: string;
};

/** A labelled number box sized for gloved hands; text input so a decimal comma or a blank is allowed. */
export function NumberField({ label, value, onChange, unit, hint, error, className }: NumberFieldProps) {
  return (
    <FieldShell label={label} unit={unit} hint={hint} error={error} className={className}>
      {(control) => (
        <input
          {...control}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          className={inputClasses}
          value={value}
          onChange={(event) => onChange(event.target.value)}
        />
      )}
    </FieldShell>
  );
}

type ChoiceFieldProps = {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: string;
  className?: string;
};

export function ChoiceField({ label, value, onChange, options, hint, className }: ChoiceFieldProps) {
  return (
    <FieldShell label={label} hint={hint} className={className}>
      {(control) => (
        <select {...control} className={inputClasses} value={value} onChange={(event) => onChange(event.target.value)}>
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
