import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import type { createBoothSchema } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { inputClasses } from '../../../components/ui/field';
import { weekdayNames } from './booth-format';

type BoothFormInput = z.input<typeof createBoothSchema>;

interface OpeningHoursEditorProps {
  control: Control<BoothFormInput, unknown, z.output<typeof createBoothSchema>>;
  register: UseFormRegister<BoothFormInput>;
  errors: FieldErrors<BoothFormInput>;
}

/** Rows of weekday + opens + closes; a day may have more than one span (e.g. a split shift). */
export function OpeningHoursEditor({ control, register, errors }: OpeningHoursEditorProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'openingHours' });
  const rowErrors = errors.openingHours;
  const listError = rowErrors?.message ?? rowErrors?.root?.message;

  const addRow = () => {
    const last = fields.at(-1);
    append({ weekday: last ? (last.weekday % 7) + 1 : 1, opens: last?.opens ?? '07:00', closes: last?.closes ?? '17:00' });
  };

  return (
    <fieldset className="rounded-panel border border-maple-300 bg-white p-3 sm:col-span-2">
      <legend className="px-1 font-semibold">Opening hours</legend>
      <p className="mb-3 text-sm text-maple-700">Times are in the shop’s timezone. Spray sessions are only planned inside these hours.</p>
      {fields.length === 0 && <p className="mb-3 font-medium">No opening hours: this booth will not be planned.</p>}
      <ul className="space-y-3">
        {fields.map((field, index) => {
          const rowError = rowErrors?.[index];
          const label = `Row ${index + 1}`;
          return (
            <li key={field.id} className="grid grid-cols-2 items-end gap-2 sm:grid-cols-[1.4fr_1fr_1fr_auto]">
              <label className="col-span-2 sm:col-span-1">
                <span className="mb-1 block text-sm font-medium">Day ({label})</span>
                <select className={inputClasses} {...register(`openingHours.${index}.weekday`, { setValueAs: Number })}>
                  {weekdayNames.map((name, dayIndex) => (
                    <option key={name} value={dayIndex + 1}>
                      {name}
                    </option>
                  ))}
                </select>
              </label>
              <label>
                <span className="mb-1 block text-sm font-medium">Opens</span>
                <input type="time" className={inputClasses} aria-invalid={Boolean(rowError?.opens)} {...register(`openingHours.${index}.opens`)} />
              </label>
              <label>
                <span className="mb-1 block text-sm font-medium">Closes</span>
                <input type="time" className={inputClasses} aria-invalid={Boolean(rowError?.closes)} {...register(`openingHours.${index}.closes`)} />
              </label>
              <Button variant="quiet" className="col-span-2 sm:col-span-1" onClick={() => remove(index)} aria-label={`Remove ${label}`}>
                Remove
              </Button>
              {(rowError?.opens || rowError?.closes || rowError?.weekday) && (
                <p role="alert" className="col-span-2 text-sm font-medium text-verdict-stop sm:col-span-4">
                  <span aria-hidden="true">⚠ </span>
                  {label}: {rowError.closes?.message ?? rowError.opens?.message ?? rowError.weekday?.message}
                </p>
              )}
            </li>
          );
        })}
      </ul>
      {listError && <p className="mt-2 text-sm font-medium text-verdict-stop">{listError}</p>}
      <Button variant="secondary" className="mt-3" onClick={addRow} disabled={fields.length >= 21}>
        Add opening hours
      </Button>
    </fieldset>
  );
}
