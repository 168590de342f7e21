import type { ReactNode } from 'react';
import type { Verdict } from '../../../../shared/finishing/conditions';

/** A titled block of the calculator page with its inputs on the left and results on the right on wide screens. */
export function CalculatorSection({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  const headingId = `calc-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;
  return (
    <section aria-labelledby={headingId} className="rounded-panel border border-maple-300 bg-white p-4 sm:p-6">
      <h2 id={headingId} className="text-xl font-semibold text-lacquer-900">
        {title}
      </h2>
      {intro && <p className="mt-1 text-maple-700">{intro}</p>}
      <div className="mt-4 grid gap-6 lg:grid-cols-2">{children}</div>
    </section>
  );
}

/** Results update as the user types; the live region lets a screen reader hear the new figures. */
export function Results({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div aria-live="polite" aria-label={label} role="region" className="rounded-panel bg-maple-50 p-4">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">{children}</dl>
    </div>
  );
}

export function ResultItem({ term, children }: { term: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-maple-700">{term}</dt>
      <dd className="font-semibold tabular-nums text-maple-900">{children}</dd>
    </>
  );
}

const verdictLook: Record<Verdict, { word: string; symbol: string; classes: string }> = {
  go: { word: 'Go', symbol: '✓', classes: 'bg-verdict-go text-white' },
  caution: { word: 'Caution', symbol: '!', classes: 'bg-verdict-caution text-white' },
  stop: { word: 'Stop', symbol: '✕', classes: 'bg-verdict-stop text-white' },
};

/** The verdict in words and a symbol as well as colour, so it reads without colour vision. */
export function VerdictBadge({ verdict, label }: { verdict: Verdict; label?: string }) {
  const look = verdictLook[verdict];
  return (
    <span className={`inline-flex min-h-touch items-center gap-2 rounded-panel px-3 font-bold ${look.classes}`}>
      <span aria-hidden="true">{look.symbol}</span>
      {label ?? look.word}
    </span>
  );
}

/** Information beside a go: a reading within its limit but close to it. Not a warning, so not in a verdict colour. */
export function InfoBadge() {
  return (
    <span className="inline-flex min-h-touch items-center gap-2 rounded-panel border-2 border-maple-500 bg-white px-3 font-bold text-maple-900">
      <span aria-hidden="true">i</span>
      Note
    </span>
  );
}

export function FieldGrid({ children }: { children: ReactNode }) {
  return <div className="grid gap-4 sm:grid-cols-2">{children}</div>;
}
