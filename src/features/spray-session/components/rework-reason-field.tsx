import { useState } from 'react';
import type { UseFormRegister } from 'react-hook-form';
import { reworkReasonLabels, reworkReasons } from '../../../../shared/schemas/coat';
import { SelectField } from '../../../components/ui/field';
import type { CoatEntryInput } from '../hooks/use-coat-form';

interface ReworkReasonFieldProps {
  register: UseFormRegister<CoatEntryInput>;
  /** The chosen parts already have this step, so the question is asked straight away. */
  likely: boolean;
  /** A reason already picked stays in view, so nothing hidden goes with the coat. */
  hasReason: boolean;
  /** Clears the reason when the sprayer says it is not a re-spray after all. */
  onClear: () => void;
  error?: string;
}

const reasonOptions = reworkReasons.map((reason) => ({ value: reason, label: reworkReasonLabels[reason] }));
const asReason = (value: unknown) => (value === '' || value === null || value === undefined ? null : value);

/** Why a step goes on again, for the rework report: asked when the parts already have the step, else one tap away. */
export function ReworkReasonField({ register, likely, hasReason, onClear, error }: ReworkReasonFieldProps) {
  const [opened, setOpened] = useState(false);
  const open = opened || hasReason;
  const options = [{ value: '', label: likely ? 'Not a re-spray' : 'Choose the reason…' }, ...reasonOptions];
  const select = <SelectField label="Re-spray reason" hint="Optional. Counts towards the rework report." options={options} error={error} registration={register('reworkReason', { setValueAs: asReason })} />;
  if (likely) {
    return (
      <div className="space-y-2 rounded-panel border-2 border-verdict-caution bg-white p-3">
        <p className="font-medium">These parts already have this step. If this is a re-spray, say why.</p>
        {select}
      </div>
    );
  }
  return (
    <div className="space-y-2">
      <button
        type="button"
        aria-pressed={open}
        onClick={() => {
          if (open) onClear();
          setOpened(!open);
        }}
        className={`min-h-touch rounded-panel border-2 px-4 font-semibold ${open ? 'border-lacquer-800 bg-lacquer-800 text-white' : 'border-maple-400 bg-white text-maple-900 hover:bg-maple-100'}`}
      >
        This is a re-spray
      </button>
      {open && select}
    </div>
  );
}
