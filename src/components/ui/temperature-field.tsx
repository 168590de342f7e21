import { useState } from 'react';
import type { UnitSystem } from '../../../shared/schemas/common';
import { displayDigits, fromDisplay, toDisplay, unitSymbol } from '../../../shared/units';
import { FieldShell, inputClasses } from './field';

interface TemperatureFieldProps {
  label: string;
  /** Stored in °C whatever the user sees. */
  valueC: number;
  onChange: (tempC: number) => void;
  units: UnitSystem;
  hint?: string;
  className?: string;
}

function shown(valueC: number, units: UnitSystem): string {
  const digits = displayDigits('temperature', units);
  return String(Number(toDisplay(valueC, 'temperature', units).toFixed(digits)));
}

/**
 * A temperature typed in the user's own units (°C or °F) and handed back in °C. The text is
 * kept as typed, so a half-typed "-" or a blank does not jump back; only a number is passed on.
 */
export function TemperatureField({ label, valueC, onChange, units, hint, className }: TemperatureFieldProps) {
  const [text, setText] = useState(() => shown(valueC, units));
  const parsed = Number(text.replace(',', '.'));
  const error = text.trim() === '' || !Number.isFinite(parsed) ? 'Enter a temperature as a number' : undefined;

  const change = (next: string) => {
    setText(next);
    const value = Number(next.replace(',', '.'));
    if (next.trim() !== '' && Number.isFinite(value)) onChange(fromDisplay(value, 'temperature', units));
  };

  return (
    <FieldShell label={label} unit={unitSymbol('temperature', units)} hint={hint} error={error} className={className}>
      {(control) => (
        <input {...control} type="text" inputMode="decimal" autoComplete="off" className={inputClasses} value={text} onChange={(event) => change(event.target.value)} />
      )}
    </FieldShell>
  );
}
