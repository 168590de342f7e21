import type { Verdict } from '../../../../shared/finishing/conditions';

export const verdictWords: Record<Verdict, string> = { go: 'Go', caution: 'Caution', stop: 'Stop' };
const glyphs: Record<Verdict, string> = { go: '✓', caution: '!', stop: '✕' };

const verdictFill: Record<Verdict, string> = {
  go: 'bg-verdict-go text-white',
  caution: 'bg-verdict-caution text-white',
  stop: 'bg-verdict-stop text-white',
};

export const verdictBorder: Record<Verdict, string> = {
  go: 'border-verdict-go',
  caution: 'border-verdict-caution',
  stop: 'border-verdict-stop',
};


/** A verdict always says its word; the colour and the glyph only repeat it. */
export function VerdictBadge({ verdict, label, large = false }: { verdict: Verdict; label?: string; large?: boolean }) {
  return (
    <span
      className={`inline-flex shrink-0 items-center gap-2 rounded-panel font-bold uppercase tracking-wide ${verdictFill[verdict]} ${large ? 'px-4 py-2 text-xl' : 'px-2.5 py-1 text-sm'}`}
    >
      <span aria-hidden="true">{glyphs[verdict]}</span>
      {label ?? verdictWords[verdict]}
    </span>
  );
}
