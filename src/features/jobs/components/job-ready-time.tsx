import type { UnitSystem } from '../../../../shared/schemas/common';
import { ErrorState } from '../../../components/ui/states';
import { jobReadyLines } from '../../../lib/ready-time-words';
import { useNow } from '../../../lib/use-now';
import { useJobReadyTime } from '../../../api/ready/get-ready';

/** For the assembler and the lead: when the whole job can be handled and packed, and what that assumes. */
export function JobReadyTime({ jobId, timeZone, units }: { jobId: number; timeZone: string; units: UnitSystem }) {
  const ready = useJobReadyTime(jobId);
  const now = useNow(30_000);
  if (ready.isError) return <ErrorState error={ready.error} what="when the job will be ready" onRetry={() => ready.refetch()} />;
  if (ready.isPending) return <p className="mb-6 text-maple-700">Working out when the job will be ready…</p>;
  if (!ready.data) return null;
  const { headline, details } = jobReadyLines(ready.data, now, timeZone, units);
  return (
    <section aria-labelledby="job-ready-heading" className="mb-8 rounded-panel border-2 border-lacquer-600 bg-white p-4">
      <h2 id="job-ready-heading" className="text-sm font-semibold uppercase tracking-wide text-lacquer-800">
        When it is ready
      </h2>
      <p className="mt-1 text-xl font-bold text-lacquer-900">{headline}</p>
      {details.map((line) => (
        <p key={line} className="mt-1 text-maple-800">
          {line}
        </p>
      ))}
    </section>
  );
}
