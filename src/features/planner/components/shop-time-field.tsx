import { Controller, type Control } from 'react-hook-form';
import type { z } from 'zod';
import type { createSpraySessionSchema } from '../../../../shared/schemas/spray-session';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { fromShopInputValue, toShopInputValue } from '../utils/shop-wall-clock';

type BookingInput = z.input<typeof createSpraySessionSchema>;

interface ShopTimeFieldProps {
  control: Control<BookingInput>;
  name: 'start' | 'end';
  label: string;
  timeZone: string;
  error?: string;
}

/**
 * A date and time read on the shop's clock, kept in the form as the ISO instant the API takes.
 * The schema's own words for a malformed instant mean nothing to a person, so an empty box says so plainly.
 */
export function ShopTimeField({ control, name, label, timeZone, error }: ShopTimeFieldProps) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <FieldShell label={label} error={error && !field.value ? 'Enter the day and time' : error}>
          {(shell) => (
            <input
              {...shell}
              ref={field.ref}
              name={field.name}
              type="datetime-local"
              step={900}
              className={inputClasses}
              value={toShopInputValue(field.value ?? '', timeZone)}
              onChange={(event) => field.onChange(fromShopInputValue(event.target.value, timeZone))}
              onBlur={field.onBlur}
            />
          )}
        </FieldShell>
      )}
    />
  );
}
