import { useState } from 'react';
import { inputClasses } from '../../../components/ui/field';
import { amountText, durationUnitFor, durationUnitWords, typedMinutes, type DurationUnit } from './duration-entry';

interface DurationInputProps {
  /** The time in minutes, as the form holds it and the server stores it. */
  value: number | null | undefined;
  /** Called with the minutes typed; a blank box gives `blank` (undefined, or null where the time may be left out). */
  onChange: (minutes: number | null | undefined) => void;
  onBlur: () => void;
  /** The number box's name, when no <label> names it (in a table cell). */
  label?: string;
  /** The id a <label> points at, when one names the number box. */
  id?: string;
  /** The unit box's own name; it must not contain the number box's label, so each is found by its own. */
  unitLabel: string;
  blank: null | undefined;
  invalid: boolean;
  describedBy?: string;
  placeholder?: string;
  /** Side by side in a form; stacked in a narrow table cell. */
  layout?: 'row' | 'stack';
}

type Shown = { unit: DurationUnit; text: string; minutes: number | null | undefined };

const shownFor = (minutes: number | null | undefined): Shown => {
  const unit = durationUnitFor(minutes);
  return { unit, text: amountText(minutes, unit), minutes };
};

/**
 * A time typed in minutes or hours: the number and its unit side by side, stored in minutes. Changing
 * the unit keeps the number typed ("16", then hours, is 16 h). A time set from outside (a reset, a
 * saved sheet) is shown in the unit that reads best.
 */
export function DurationInput({ value, onChange, onBlur, label, id, unitLabel, blank, invalid, describedBy, placeholder, layout = 'stack' }: DurationInputProps) {
  const [shown, setShown] = useState<Shown>(() => shownFor(value));
  if (!Object.is(value, shown.minutes)) setShown(shownFor(value));

  const show = (text: string, unit: DurationUnit) => {
    const minutes = typedMinutes(text, unit) ?? blank;
    setShown({ text, unit, minutes });
    onChange(minutes);
  };

  return (
    <div className={layout === 'row' ? 'flex gap-2' : 'flex flex-col gap-1'}>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        className={inputClasses}
        aria-label={label}
        aria-invalid={invalid}
        aria-describedby={describedBy}
        placeholder={placeholder}
        value={shown.text}
        onChange={(event) => show(event.target.value, shown.unit)}
        onBlur={onBlur}
      />
      <select aria-label={unitLabel} className={`${inputClasses} px-2 ${layout === 'row' ? 'w-28 shrink-0' : ''}`} value={shown.unit} onChange={(event) => show(shown.text, event.target.value as DurationUnit)} onBlur={onBlur}>
        {(['min', 'h'] as const).map((unit) => (
          <option key={unit} value={unit}>
            {durationUnitWords[unit]}
          </option>
        ))}
      </select>
    </div>
  );
}
