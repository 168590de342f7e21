import { boardOrder, stateLabels } from './readiness';
import { ReadyStateBadge } from './ready-state-badge';
import type { ReadySummaryJob } from '../../../../shared/schemas/ready';

/** One job on the wall: its reference large enough to read across the shop, and its parts per state. */
export function WallJobCard({ job }: { job: ReadySummaryJob }) {
  const states = boardOrder.filter((state) => state !== 'collected' && (job.counts[state] ?? 0) > 0);
  return (
    <section aria-labelledby={`wall-job-${job.jobId}`} className="rounded-panel border-4 border-maple-900 bg-white p-5">
      <h2 id={`wall-job-${job.jobId}`} className="text-4xl font-bold leading-tight text-maple-900 xl:text-5xl">
        {job.jobReference}
      </h2>
      <p className="mb-4 truncate text-2xl font-medium text-maple-800">{job.customer}</p>
      <ul className="space-y-3">
        {states.map((state) => (
          <li key={state} className="flex items-center justify-between gap-4">
            <ReadyStateBadge state={state} large />
            <span className="text-4xl font-bold tabular-nums text-maple-900 xl:text-5xl">
              {job.counts[state]}
              <span className="sr-only"> {stateLabels[state].toLowerCase()}</span>
            </span>
          </li>
        ))}
      </ul>
      {(job.counts.collected ?? 0) > 0 && <p className="mt-3 text-xl text-maple-800">{job.counts.collected} already collected</p>}
    </section>
  );
}
