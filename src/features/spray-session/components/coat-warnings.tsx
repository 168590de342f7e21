import type { CoatWarning } from '../../../../shared/finishing/coat-record';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { VerdictBadge } from './verdict-badge';

interface CoatWarningsProps {
  warnings: CoatWarning[];
  reasons: Record<string, string>;
  errors: Record<string, string>;
  onReason: (code: string, reason: string) => void;
}

/** Every warning the coat will carry; each stop needs the sprayer's reason before the coat can be recorded. */
export function CoatWarnings({ warnings, reasons, errors, onReason }: CoatWarningsProps) {
  if (warnings.length === 0) {
    return (
      <p className="flex items-center gap-3 rounded-panel border-2 border-verdict-go bg-white p-3 text-lg">
        <VerdictBadge verdict="go" /> No warnings for this coat.
      </p>
    );
  }
  return (
    <ul aria-label="Warnings for this coat" className="space-y-3">
      {warnings.map((warning) => (
        <li key={warning.code} className="rounded-panel border-2 border-maple-300 bg-white p-3">
          <p className="flex items-start gap-3">
            <VerdictBadge verdict={warning.verdict} />
            <span className="text-lg">{warning.message}</span>
          </p>
          {warning.verdict === 'stop' && (
            <FieldShell className="mt-2" label="Why this coat goes on anyway" hint="Required for a stop; kept on the coat record." error={errors[warning.code]}>
              {(control) => <textarea {...control} rows={2} className={inputClasses} value={reasons[warning.code] ?? ''} onChange={(event) => onReason(warning.code, event.target.value)} />}
            </FieldShell>
          )}
        </li>
      ))}
    </ul>
  );
}
