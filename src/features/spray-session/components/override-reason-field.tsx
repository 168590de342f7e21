import type { UseFormRegister } from 'react-hook-form';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import type { ChecklistInput } from './checklist-fields';

const emptyAsNull = (value: unknown) => (typeof value === 'string' && value.trim() === '' ? null : value);

/** Only a finishing lead sees this: the reason is recorded with the checks and shown to everyone after. */
export function OverrideReasonField({ register, error }: { register: UseFormRegister<ChecklistInput>; error?: string }) {
  return (
    <FieldShell label="Lead’s reason to spray despite the stop" hint="Recorded with the checks and shown on the session and in the activity log." error={error}>
      {(control) => <textarea {...control} rows={2} className={inputClasses} {...register('overrideReason', { setValueAs: emptyAsNull })} />}
    </FieldShell>
  );
}
