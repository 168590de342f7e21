/** The tone of a status: always shown with its words, never colour alone. */
export type StatusTone = 'go' | 'caution' | 'stop' | 'quiet';

const tones: Record<StatusTone, string> = {
  go: 'border-verdict-go text-verdict-go',
  caution: 'border-verdict-caution text-verdict-caution',
  stop: 'border-verdict-stop bg-verdict-stop text-white',
  quiet: 'border-maple-400 text-maple-800',
};
const marks: Record<StatusTone, string> = { go: '✓', caution: '!', stop: '✕', quiet: '–' };

export function StatusBadge({ tone, children }: { tone: StatusTone; children: string }) {
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full border-2 bg-white px-2 py-0.5 text-sm font-semibold ${tones[tone]}`}>
      <span aria-hidden="true">{marks[tone]}</span>
      {children}
    </span>
  );
}
