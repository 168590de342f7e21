import type { UseFormRegisterReturn } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { FieldShell, inputClasses } from '../../../components/ui/field';

interface OverrideReasonPanelProps {
  message: string;
  registration: UseFormRegisterReturn;
  error?: string;
  pending: boolean;
  confirmLabel: string;
  backLabel?: string;
  onBack: () => void;
}

/** Outside opening hours a lead may still book, but only with a reason that goes on the record. */
export function OverrideReasonPanel({ message, registration, error, pending, confirmLabel, backLabel = 'Change the time instead', onBack }: OverrideReasonPanelProps) {
  return (
    <div className="mt-4 rounded-panel border-2 border-verdict-caution bg-white p-4">
      <p role="alert" className="font-medium text-verdict-caution">
        <span aria-hidden="true">⚠ </span>
        {message}
      </p>
      <FieldShell label="Reason for booking anyway" hint="Kept with the session and in the activity log." error={error} className="mt-3">
        {(control) => <textarea {...control} rows={2} className={inputClasses} {...registration} />}
      </FieldShell>
      <div className="mt-3 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onBack}>
          {backLabel}
        </Button>
        <Button type="submit" variant="danger" pending={pending} pendingText="Booking…">
          {confirmLabel}
        </Button>
      </div>
    </div>
  );
}
