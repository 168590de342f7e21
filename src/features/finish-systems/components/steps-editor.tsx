import { useEffect, useRef, useState, type DragEvent } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import type { Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { coatAtStepWords, terms } from '../../../../shared/words';
import { StepRow, type FinishSystemFormInput } from './step-row';

const maxSteps = 30;
// A coat starts with no product chosen (0 shows "Choose a product…"); the schema asks for one on save.
const newCoat = { kind: 'coat' as const, productId: 0, dryFilmUm: undefined as unknown as number };
const newAbrade = { kind: 'abrade' as const, grit: 'P320' };

/** "Step 3: coat 2 of 3" or "Step 2: denib": the stored kind 'abrade' is a denib in the shop's words. */
function stepHeading(steps: { kind: 'coat' | 'abrade' }[], index: number): string {
  const which = coatAtStepWords(steps.map((step, position) => ({ position, kind: step.kind })), index);
  return `Step ${index + 1}: ${which ?? terms.denib}`;
}

/** Drag state: which step is being dragged and where it would land. Dragging starts only from the grip. */
function useStepDrag(move: (from: number, to: number) => void) {
  const [armed, setArmed] = useState<number | null>(null);
  const [from, setFrom] = useState<number | null>(null);
  const [over, setOver] = useState<number | null>(null);
  const end = () => {
    setArmed(null);
    setFrom(null);
    setOver(null);
  };
  const itemProps = (index: number) => ({
    draggable: armed === index,
    onDragStart: (event: DragEvent) => {
      event.dataTransfer.effectAllowed = 'move';
      event.dataTransfer.setData('text/plain', String(index));
      setFrom(index);
    },
    // Both enter and over must be cancelled for the step to count as a drop target.
    onDragEnter: (event: DragEvent) => {
      if (from !== null) event.preventDefault();
    },
    onDragOver: (event: DragEvent) => {
      if (from === null) return;
      event.preventDefault();
      event.dataTransfer.dropEffect = 'move';
      setOver(index);
    },
    onDrop: (event: DragEvent) => {
      event.preventDefault();
      if (from !== null && from !== index) move(from, index);
      end();
    },
    onDragEnd: end,
  });
  return { itemProps, arm: setArmed, disarm: () => armed !== null && from === null && setArmed(null), over, from };
}

export function StepsEditor({ products }: { products: Product[] }) {
  const { control, formState } = useFormContext<FinishSystemFormInput>();
  const { fields, append, remove, move } = useFieldArray({ control, name: 'steps' });
  const [announcement, setAnnouncement] = useState('');
  const focusAfterMove = useRef<string | null>(null);

  const moveStep = (from: number, to: number) => {
    move(from, to);
    setAnnouncement(`Step ${from + 1} is now step ${to + 1} of ${fields.length}.`);
    const id = fields[from].id;
    // Keep the keyboard on the step that moved; at the top or bottom its own button is disabled, so use the other one.
    focusAfterMove.current = to === 0 ? `${id}-down` : to === fields.length - 1 ? `${id}-up` : to < from ? `${id}-up` : `${id}-down`;
  };
  const drag = useStepDrag(moveStep);

  useEffect(() => {
    if (!focusAfterMove.current) return;
    document.getElementById(focusAfterMove.current)?.focus();
    focusAfterMove.current = null;
  }, [fields]);

  const listError = formState.errors.steps?.message ?? formState.errors.steps?.root?.message;
  return (
    <fieldset className="min-w-0 rounded-panel border border-maple-300 bg-white p-3">
      <legend className="px-1 font-semibold">Steps, in the order they are done</legend>
      <p className="mb-3 text-sm text-maple-700">Move a step with Up and Down, or drag it by its grip.</p>
      <ol className="space-y-3">
        {fields.map((field, index) => (
          <li
            key={field.id}
            {...drag.itemProps(index)}
            className={`flex gap-3 rounded-panel border p-3 ${drag.over === index && drag.from !== index ? 'border-2 border-dashed border-lacquer-500 bg-lacquer-50' : 'border-maple-300'} ${drag.from === index ? 'opacity-60' : ''}`}
          >
            <span
              aria-hidden="true"
              title="Drag to move this step"
              className="flex w-8 shrink-0 cursor-grab select-none items-center justify-center rounded-panel bg-maple-100 text-xl text-maple-700"
              onPointerDown={() => drag.arm(index)}
              onPointerUp={drag.disarm}
            >
              ⠿
            </span>
            <StepRow index={index} kind={field.kind} heading={stepHeading(fields, index)} count={fields.length} fieldId={field.id} products={products} onMove={moveStep} onRemove={remove} />
          </li>
        ))}
      </ol>
      {fields.length === 0 && <p className="text-maple-700">No steps yet. Add the first coat.</p>}
      {listError && <p className="mt-2 text-sm font-medium text-verdict-stop">{listError}</p>}
      <div className="mt-3 flex flex-wrap gap-3">
        <Button variant="secondary" onClick={() => append(newCoat)} disabled={fields.length >= maxSteps}>
          Add coat
        </Button>
        <Button variant="secondary" onClick={() => append(newAbrade)} disabled={fields.length >= maxSteps}>
          Add denib step
        </Button>
      </div>
      <p aria-live="polite" className="sr-only">
        {announcement}
      </p>
    </fieldset>
  );
}
