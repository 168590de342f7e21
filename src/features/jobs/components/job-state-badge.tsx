import type { JobState } from '../../../../shared/schemas/job';
import { jobStateLabels } from './job-format';

const tones: Record<JobState, string> = {
  open: 'border-maple-400 bg-white text-maple-900',
  'in-finish': 'border-lacquer-400 bg-lacquer-50 text-lacquer-900',
  ready: 'border-verdict-go bg-white text-verdict-go',
  delivered: 'border-maple-500 bg-maple-100 text-maple-900',
  cancelled: 'border-maple-300 bg-maple-100 text-maple-700 line-through decoration-1',
};

/** The state in words; the colour only repeats it. */
export function JobStateBadge({ state }: { state: JobState }) {
  return <span className={`inline-block whitespace-nowrap rounded-full border px-2 py-0.5 text-sm font-medium ${tones[state]}`}>{jobStateLabels[state]}</span>;
}
