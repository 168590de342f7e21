interface ToggleFieldProps {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  hint?: string;
}

/** A whole-row switch that a gloved hand can hit; it says Yes or No, not just a colour. */
export function ToggleField({ label, checked, onChange, hint }: ToggleFieldProps) {
  return (
    <button
      type="button"
      role="switch"
      aria-checked={checked}
      onClick={() => onChange(!checked)}
      className={`flex min-h-16 w-full items-center justify-between gap-4 rounded-panel border-2 px-4 py-3 text-left ${checked ? 'border-verdict-go bg-white' : 'border-maple-400 bg-maple-50'}`}
    >
      <span>
        <span className="block text-lg font-semibold text-maple-900">{label}</span>
        {hint && <span className="block text-sm text-maple-700">{hint}</span>}
      </span>
      <span
        aria-hidden="true"
        className={`min-w-20 rounded-panel px-3 py-2 text-center text-lg font-bold ${checked ? 'bg-verdict-go text-white' : 'border-2 border-maple-500 bg-white text-maple-800'}`}
      >
        {checked ? '✓ Yes' : 'No'}
      </span>
    </button>
  );
}
