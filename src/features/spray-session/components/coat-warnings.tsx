import type { CoatWarning } from '../../../../shared/finishing/coat-record';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { VerdictBadge } from './verdict-badge';

interface CoatWarningsProps {
  warnings: CoatWarning[];
  reason: string;
  error: string | null;
  onReason: (reason: string) => void;
}

/** Every warning the coat will carry; one reason from the sprayer covers all its stops. */
export function CoatWarnings({ warnings, reason, error, onReason }: CoatWarningsProps) {
  if (warnings.length === 0) {
    return (
      <p className="flex items-center gap-3 rounded-panel border-2 border-verdict-go bg-white p-3 text-lg">
        <VerdictBadge verdict="go" /> No warnings for this coat.
      </p>
    );
  }
  const stops = warnings.filter((w) => w.verdict === 'stop').length;
  return (
    <div className="space-y-3">
      <ul aria-label="Warnings for this coat" className="space-y-3">
        {warnings.map((warning) => (
          <li key={warning.code} className={`rounded-panel border-2 bg-white p-3 ${warning.verdict === 'stop' ? 'border-verdict-stop' : 'border-maple-300'}`}>
            <p className="flex items-start gap-3">
              <VerdictBadge verdict={warning.verdict} />
              <span className="text-lg">{warning.message}</span>
            </p>
          </li>
        ))}
      </ul>
      {stops > 0 && (
        <FieldShell
          label="Why this coat goes on anyway"
          hint={stops === 1 ? 'Required for the stop above; kept on the coat record.' : `One reason for all ${stops} stops above; kept on the coat record with each.`}
          error={error ?? undefined}
        >
          {(control) => <textarea {...control} rows={2} className={inputClasses} value={reason} onChange={(event) => onReason(event.target.value)} />}
        </FieldShell>
      )}
    </div>
  );
}
