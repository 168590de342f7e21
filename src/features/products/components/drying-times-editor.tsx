import { Controller, useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { DryingRow } from '../../../../shared/finishing/drying-row-schema';
import { Button } from '../../../components/ui/button';
import { asNumber, asNumberOrNull, inputClasses } from '../../../components/ui/field';
import { DurationInput } from './duration-input';
import { newDryingRow, type ProductFormInput } from './product-form-values';

/** Times in minutes are typed in minutes or hours, each box with its own unit; the others have one unit. */
export const dryingColumns: ReadonlyArray<{ key: keyof DryingRow; label: string; unit: string }> = [
  { key: 'tempC', label: 'Temperature', unit: '°C' },
  { key: 'flashOffMin', label: 'Flash-off', unit: 'min or h' },
  { key: 'recoatMinMin', label: 'Recoat from', unit: 'min or h' },
  { key: 'recoatMaxMin', label: 'Recoat until', unit: 'min or h' },
  { key: 'touchDryMin', label: 'Touch dry', unit: 'min or h' },
  { key: 'handleMin', label: 'Handle', unit: 'min or h' },
  { key: 'packMin', label: 'Pack', unit: 'min or h' },
  { key: 'fullCureH', label: 'Full cure', unit: 'h' },
];

const maxRows = 12;

type Column = (typeof dryingColumns)[number];

function TimeInput({
  index,
  column,
  error,
  errorId,
}: {
  index: number;
  column: Column;
  error: string | undefined;
  errorId: string;
}) {
  const { control } = useFormContext<ProductFormInput>();
  return (
    <Controller
      control={control}
      name={`dryingTimes.${index}.${column.key}`}
      render={({ field }) => (
        <DurationInput
          value={field.value}
          onChange={field.onChange}
          onBlur={field.onBlur}
          label={`${column.label}, row ${index + 1}`}
          unitLabel={`${column.label} unit, row ${index + 1}`}
          // "Recoat until" may be blank: the data sheet gives no latest recoat time, so the window never closes.
          blank={column.key === 'recoatMaxMin' ? null : undefined}
          invalid={Boolean(error)}
          describedBy={error ? errorId : undefined}
          placeholder={column.key === 'recoatMaxMin' ? 'None' : undefined}
        />
      )}
    />
  );
}

function DryingCell({ index, column }: { index: number; column: Column }) {
  const {
    register,
    formState: { errors },
  } = useFormContext<ProductFormInput>();
  const error = errors.dryingTimes?.[index]?.[column.key]?.message;
  const errorId = `drying-${index}-${column.key}-error`;
  const setValueAs = column.key === 'recoatMaxMin' ? asNumberOrNull : asNumber;
  return (
    <td className="min-w-[6rem] px-1 py-2 align-top">
      {column.unit === 'min or h' ? (
        <TimeInput index={index} column={column} error={error} errorId={errorId} />
      ) : (
        <input
          type="number"
          inputMode="decimal"
          step="any"
          className={inputClasses}
          aria-label={`${column.label} (${column.unit}), row ${index + 1}`}
          aria-invalid={Boolean(error)}
          aria-describedby={error ? errorId : undefined}
          placeholder={column.key === 'recoatMaxMin' ? 'None' : undefined}
          {...register(`dryingTimes.${index}.${column.key}`, { setValueAs })}
        />
      )}
      {error && (
        <p id={errorId} className="mt-1 max-w-[12rem] text-sm font-medium text-verdict-stop">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
    </td>
  );
}

function DryingTableHead() {
  return (
    <thead>
      <tr className="border-b border-maple-300 text-sm">
        <th scope="col" className="px-1 py-2 align-bottom font-semibold">
          Row
        </th>
        {dryingColumns.map((column) => (
          <th key={column.key} scope="col" className="px-1 py-2 align-bottom font-semibold">
            <span className="block whitespace-nowrap">{column.label}</span>{' '}
            <span className="block font-normal text-maple-700">({column.unit})</span>
          </th>
        ))}
        <th scope="col" className="px-1 py-2">
          <span className="sr-only">Remove</span>
        </th>
      </tr>
    </thead>
  );
}

/** The data sheet's drying table: one row per temperature it gives times at. */
export function DryingTimesEditor() {
  const { control, formState } = useFormContext<ProductFormInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'dryingTimes' });
  const rows = useWatch({ control, name: 'dryingTimes' }) ?? [];
  const listError = formState.errors.dryingTimes?.message ?? formState.errors.dryingTimes?.root?.message;

  return (
    <fieldset className="min-w-0 rounded-panel border border-maple-300 bg-white p-4">
      <legend className="px-1 text-lg font-semibold text-lacquer-900">Drying times</legend>
      <p className="mb-3 max-w-3xl text-sm text-maple-700">
        One row for each temperature the data sheet gives. Recoat from is the earliest the next coat may go on; recoat
        until is the latest before the surface needs a denib. Leave recoat until empty when the sheet gives no limit, in
        every row.
      </p>
      <div className="relative overflow-x-auto">
        <table className="w-full border-collapse text-left">
          <DryingTableHead />
          <tbody>
            {fields.map((field, index) => (
              <tr key={field.id} className="border-b border-maple-200 last:border-b-0">
                <th scope="row" className="px-1 py-2 align-top font-semibold leading-[2.75rem]">
                  {index + 1}
                </th>
                {dryingColumns.map((column) => (
                  <DryingCell key={column.key} index={index} column={column} />
                ))}
                <td className="px-1 py-2 align-top">
                  <Button
                    variant="quiet"
                    onClick={() => remove(index)}
                    disabled={fields.length <= 1}
                    aria-label={`Remove row ${index + 1}`}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {listError && <p className="mt-2 text-sm font-medium text-verdict-stop">{listError}</p>}
      <Button
        variant="secondary"
        className="mt-3"
        onClick={() => append(newDryingRow(rows))}
        disabled={fields.length >= maxRows}
      >
        Add a temperature row
      </Button>
    </fieldset>
  );
}
