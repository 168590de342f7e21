import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { displayDigits, fromDisplay, toDisplay, unitSymbol, type Quantity } from '../../../../shared/units';
import { FieldShell, inputClasses } from '../../../components/ui/field';

interface StepperFieldProps {
  label: string;
  /** Stored (SI) value; null when nothing is entered. */
  value: number | null | undefined;
  onChange: (value: number | null) => void;
  /** Converted to the user's units for display and entry; plain numbers (%, ratios) leave it out. */
  quantity?: Quantity;
  units: UnitSystem;
  unit?: string;
  /** One tap of − or +, in the units shown. */
  step: number;
  min?: number;
  max?: number;
  digits?: number;
  hint?: string;
  error?: string;
  className?: string;
}

const parse = (text: string) => (text.trim() === '' ? null : Number(text.replace(',', '.')));

/**
 * A number with big − and + buttons either side, for gloves; the box still takes typing.
 * The text is kept as typed so a half-typed "1." or a blank does not jump.
 */
export function StepperField({ label, value, onChange, quantity, units, unit, step, min, max, digits, hint, error, className }: StepperFieldProps) {
  const shownDigits = digits ?? (quantity ? displayDigits(quantity, units) : 1);
  const toShown = (si: number) => Number((quantity ? toDisplay(si, quantity, units) : si).toFixed(shownDigits));
  const toSi = (shown: number) => (quantity ? fromDisplay(shown, quantity, units) : shown);
  const format = (si: number | null | undefined) => (si === null || si === undefined ? '' : String(toShown(si)));
  const [text, setText] = useState(() => format(value));
  const [seen, setSeen] = useState(value);
  // A value set from outside (a prefill, a reset) replaces the text; one typed here already matches it.
  if (seen !== value) {
    setSeen(value);
    const typed = parse(text);
    const same = value === null || value === undefined ? typed === null : typed !== null && toShown(value) === typed;
    if (!same) setText(format(value));
  }

  const emit = (shown: number | null) => {
    const si = shown === null || !Number.isFinite(shown) ? null : toSi(shown);
    setSeen(si);
    onChange(si);
  };
  const type = (next: string) => {
    setText(next);
    emit(parse(next));
  };
  const nudge = (direction: 1 | -1) => {
    const current = parse(text);
    const base = current === null || !Number.isFinite(current) ? (min ?? 0) : current;
    let next = Number((base + direction * step).toFixed(shownDigits));
    if (min !== undefined) next = Math.max(min, next);
    if (max !== undefined) next = Math.min(max, next);
    setText(String(next));
    emit(next);
  };

  const symbol = quantity ? unitSymbol(quantity, units) : unit;
  const buttonClass = 'min-h-14 min-w-14 shrink-0 rounded-panel border-2 border-maple-500 bg-white text-2xl font-bold text-maple-900 hover:bg-maple-100';
  return (
    <FieldShell label={label} unit={symbol} hint={hint} error={error} className={className}>
      {(control) => (
        <div className="flex items-stretch gap-2">
          <button type="button" className={buttonClass} onClick={() => nudge(-1)} aria-label={`Less ${label.toLowerCase()}`}>
            −
          </button>
          <input
            {...control}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            className={`${inputClasses} min-h-14 min-w-0 flex-1 text-center text-xl font-semibold`}
            value={text}
            onChange={(event) => type(event.target.value)}
          />
          <button type="button" className={buttonClass} onClick={() => nudge(1)} aria-label={`More ${label.toLowerCase()}`}>
            +
          </button>
        </div>
      )}
    </FieldShell>
  );
}
