import { useWatch, type Control, type FieldErrors, type UseFormRegister, type UseFormSetValue } from 'react-hook-form';
import type { z } from 'zod';
import { pieceAreaM2 } from '../../../../shared/finishing/area';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { createPartSchema } from '../../../../shared/schemas/part';
import type { Rack } from '../../../../shared/schemas/rack';
import { SelectField } from '../../../components/ui/field';
import { formatQuantity } from '../../../lib/units-display';
import { areaRuleWords } from './part-format';

export type PartFormInput = z.input<typeof createPartSchema>;
export type PartFormOutput = z.output<typeof createPartSchema>;
export type RackChoice = Pick<Rack, 'id' | 'name' | 'shelves'>;
type FormControl = Control<PartFormInput, unknown, PartFormOutput>;

export const asIdOrNull = (value: unknown) => (value === '' || value === null || value === undefined ? null : Number(value));

function LiveArea({ control, units }: { control: FormControl; units: UnitSystem }) {
  const [lengthMm, widthMm, thicknessMm, quantity, faces, edges] = useWatch({ control, name: ['lengthMm', 'widthMm', 'thicknessMm', 'quantity', 'faces', 'edges'] });
  const sizes = [lengthMm, widthMm, thicknessMm].map(Number);
  if (!sizes.every((n) => Number.isFinite(n) && n > 0)) return <p className="text-maple-700">Enter the sizes to see the coated area.</p>;
  const piece = pieceAreaM2({ lengthMm: sizes[0], widthMm: sizes[1], thicknessMm: sizes[2], faces: faces ?? 'both', edges: edges ?? true });
  const pieces = Number(quantity) >= 1 ? Math.floor(Number(quantity)) : 1;
  return (
    <p aria-live="polite" className="font-medium">
      Coated area: {formatQuantity('area', piece, units)} a piece, {formatQuantity('area', piece * pieces, units)} for {pieces} {pieces === 1 ? 'piece' : 'pieces'}
    </p>
  );
}

/** Which surfaces get finish, with the area rule stated beside the choice and the area worked out as you type. */
export function CoatedSurfaces({ control, register, units }: { control: FormControl; register: UseFormRegister<PartFormInput>; units: UnitSystem }) {
  const radio = 'size-5 accent-lacquer-700';
  return (
    <fieldset className="col-span-2 rounded-panel border border-maple-300 bg-white p-3">
      <legend className="px-1 font-semibold">Coated surfaces</legend>
      <p className="mb-2 text-sm text-maple-700">{areaRuleWords}</p>
      <div className="flex flex-wrap gap-x-6 gap-y-1">
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" value="both" className={radio} {...register('faces')} /> Both faces
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="radio" value="one" className={radio} {...register('faces')} /> One face
        </label>
        <label className="flex min-h-touch items-center gap-2">
          <input type="checkbox" className={radio} {...register('edges')} /> All four edges
        </label>
      </div>
      <LiveArea control={control} units={units} />
    </fieldset>
  );
}

interface RackPlaceProps {
  control: FormControl;
  register: UseFormRegister<PartFormInput>;
  setValue: UseFormSetValue<PartFormInput>;
  errors: FieldErrors<PartFormInput>;
  racks: RackChoice[];
}

/** Shelf choices follow the chosen rack, so a shelf the rack does not have cannot be picked. */
export function RackPlace({ control, register, setValue, errors, racks }: RackPlaceProps) {
  const rackId = useWatch({ control, name: 'rackId' });
  const rack = racks.find((r) => r.id === Number(rackId));
  const rackOptions = [{ value: '', label: 'Not on a rack' }, ...racks.map((r) => ({ value: r.id, label: `${r.name} (${r.shelves} shelves)` }))];
  const shelfOptions = [{ value: '', label: rack ? 'Any shelf' : 'Choose a rack first' }, ...Array.from({ length: rack?.shelves ?? 0 }, (_, i) => ({ value: i + 1, label: `Shelf ${i + 1}` }))];
  return (
    <>
      <SelectField className="col-span-2 sm:col-span-1" label="Rack" options={rackOptions} error={errors.rackId?.message} registration={register('rackId', { setValueAs: asIdOrNull, onChange: () => setValue('shelf', null) })} />
      <SelectField className="col-span-2 sm:col-span-1" label="Shelf" options={shelfOptions} disabled={!rack} error={errors.shelf?.message} registration={register('shelf', { setValueAs: asIdOrNull })} />
    </>
  );
}
