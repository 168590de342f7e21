import { get, useFormContext } from 'react-hook-form';
import type { z } from 'zod';
import type { createFinishSystemSchema } from '../../../../shared/schemas/finish-system';
import type { Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { asNumber, InputField, SelectField } from '../../../components/ui/field';

export type FinishSystemFormInput = z.input<typeof createFinishSystemSchema>;

interface StepRowProps {
  index: number;
  kind: 'coat' | 'abrade';
  /** What the step is, in words: "Step 3: coat 2 of 3", "Step 2: denib". */
  heading: string;
  count: number;
  fieldId: string;
  products: Product[];
  onMove: (from: number, to: number) => void;
  onRemove: (index: number) => void;
}

function CoatFields({ index, products }: { index: number; products: Product[] }) {
  const { register, setValue, formState } = useFormContext<FinishSystemFormInput>();
  const error = (name: string) => (get(formState.errors, `steps.${index}.${name}`) as { message?: string } | undefined)?.message;
  const options = [{ value: 0, label: 'Choose a product…' }, ...products.map((p) => ({ value: p.id, label: p.makerRef ? `${p.name} (${p.makerRef})` : p.name }))];
  // Choosing a product fills in its recommended dry film, which the lead can still change.
  const prefillFilm = (productId: number) => {
    const film = products.find((p) => p.id === productId)?.dryFilmPerCoatUm;
    if (film) setValue(`steps.${index}.dryFilmUm`, film, { shouldValidate: formState.isSubmitted });
  };
  return (
    <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
      <SelectField
        label={`Product, step ${index + 1}`}
        options={options}
        error={error('productId')}
        registration={register(`steps.${index}.productId`, { setValueAs: Number, onChange: (event) => prefillFilm(Number(event.target.value)) })}
      />
      <InputField
        type="number"
        inputMode="decimal"
        step="any"
        label={`Dry film target, step ${index + 1}`}
        unit="µm"
        error={error('dryFilmUm')}
        registration={register(`steps.${index}.dryFilmUm`, { setValueAs: asNumber })}
      />
    </div>
  );
}

function AbradeFields({ index }: { index: number }) {
  const { register, formState } = useFormContext<FinishSystemFormInput>();
  const error = (get(formState.errors, `steps.${index}.grit`) as { message?: string } | undefined)?.message;
  return <InputField label={`Grit, step ${index + 1}`} hint="A P-grade, e.g. P320." error={error} registration={register(`steps.${index}.grit`)} className="max-w-56" />;
}

/** One step of the system; Up and Down move it by keyboard, the grip moves it by dragging. */
export function StepRow({ index, kind, heading, count, fieldId, products, onMove, onRemove }: StepRowProps) {
  const n = index + 1;
  return (
    <div className="min-w-0 flex-1 space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-semibold">{heading}</p>
        <div className="flex flex-wrap gap-2">
          <Button id={`${fieldId}-up`} variant="secondary" disabled={index === 0} onClick={() => onMove(index, index - 1)} aria-label={`Move step ${n} up`}>
            Up
          </Button>
          <Button id={`${fieldId}-down`} variant="secondary" disabled={index === count - 1} onClick={() => onMove(index, index + 1)} aria-label={`Move step ${n} down`}>
            Down
          </Button>
          <Button variant="quiet" onClick={() => onRemove(index)} aria-label={`Remove step ${n}`}>
            Remove
          </Button>
        </div>
      </div>
      {kind === 'coat' ? <CoatFields index={index} products={products} /> : <AbradeFields index={index} />}
    </div>
  );
}
