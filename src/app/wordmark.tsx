/** Boothwright's mark: a panel taking three passes of a spray fan, in our lacquer green. */
export function Wordmark() {
  return (
    <span className="inline-flex items-center gap-2">
      <svg viewBox="0 0 32 32" className="size-8 shrink-0" aria-hidden="true" focusable="false">
        <rect x="2" y="2" width="28" height="28" rx="6" fill="#eef7f4" />
        <path d="M7 10h18M7 16h18M7 22h12" stroke="#2a7f69" strokeWidth="3.2" strokeLinecap="round" />
        <circle cx="24.5" cy="22" r="2.6" fill="#b49d78" />
      </svg>
      <span className="text-xl font-bold tracking-tight text-white">
        Booth<span className="font-medium text-lacquer-200">wright</span>
      </span>
    </span>
  );
}
