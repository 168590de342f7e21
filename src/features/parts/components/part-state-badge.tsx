import { partStateLabel } from './part-format';

const ready = new Set(['ready-to-handle', 'ready-to-pack', 'cured', 'collected']);

/** The state in words; the border colour only echoes whether the part can be picked up. */
export function PartStateBadge({ state }: { state: string }) {
  const tone = ready.has(state) ? 'border-verdict-go text-verdict-go' : state === 'waiting' ? 'border-maple-400 text-maple-800' : 'border-lacquer-400 text-lacquer-800';
  return <span className={`inline-block whitespace-nowrap rounded-full border bg-white px-2 py-0.5 text-sm font-medium ${tone}`}>{partStateLabel(state)}</span>;
}
