import { respiratorKinds } from '../../../../shared/schemas/checklist';
import type { RespiratorLevel } from '../../../../shared/finishing/cautions';

const respiratorLabels: Record<RespiratorLevel, string> = {
  'air-fed': 'Air-fed hood or visor',
  'vapour-and-particulate': 'Mask with vapour and particulate filters',
  particulate: 'Mask with particulate filter only',
};

interface RespiratorChoiceProps {
  value: RespiratorLevel | undefined;
  onChange: (kind: RespiratorLevel) => void;
  /** What the session's products call for; null when the products are not known. */
  needed: RespiratorLevel | null;
  error?: string;
}

/** Three big radio cards; the one the products need is marked in words. */
export function RespiratorChoice({ value, onChange, needed, error }: RespiratorChoiceProps) {
  return (
    <fieldset aria-invalid={Boolean(error)}>
      <legend className="mb-2 text-lg font-semibold text-maple-900">Respiratory protection worn</legend>
      <div className="grid gap-2 sm:grid-cols-3">
        {respiratorKinds.map((kind) => (
          <label
            key={kind}
            className={`flex min-h-16 cursor-pointer items-start gap-3 rounded-panel border-2 p-3 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-lacquer-500 ${value === kind ? 'border-lacquer-700 bg-lacquer-50' : 'border-maple-400 bg-white'}`}
          >
            <input type="radio" name="respiratorKind" value={kind} checked={value === kind} onChange={() => onChange(kind)} className="mt-1 size-6 shrink-0 accent-lacquer-700" />
            <span>
              <span className="block font-semibold">{respiratorLabels[kind]}</span>
              {needed === kind && <span className="block text-sm font-bold text-lacquer-800">Needed for these products</span>}
            </span>
          </label>
        ))}
      </div>
      {error && (
        <p className="mt-1 text-sm font-medium text-verdict-stop">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
    </fieldset>
  );
}
