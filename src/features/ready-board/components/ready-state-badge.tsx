import type { ReadinessState } from '../../../../shared/finishing/readiness';
import { pickUpStates, stateLabels } from './readiness';

const tones: Record<ReadinessState, string> = {
  waiting: 'border-maple-400 text-maple-800',
  'in-finish': 'border-lacquer-500 text-lacquer-800',
  drying: 'border-verdict-caution text-verdict-caution',
  'ready-to-handle': 'border-verdict-go text-verdict-go',
  'ready-to-pack': 'border-verdict-go text-verdict-go',
  cured: 'border-verdict-go text-verdict-go',
  collected: 'border-dashed border-maple-400 text-maple-700',
};

/** The state in words; the colour only echoes it, and a tick marks what can be picked up. */
export function ReadyStateBadge({ state, large = false }: { state: ReadinessState; large?: boolean }) {
  const size = large ? 'border-[3px] px-4 py-1 text-2xl xl:text-3xl' : 'border px-2 py-0.5 text-sm';
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full bg-white font-semibold ${size} ${tones[state]}`}>
      {pickUpStates.has(state) && <span aria-hidden="true">✓</span>}
      {stateLabels[state]}
    </span>
  );
}
