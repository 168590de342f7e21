import type { Job } from '../../../../shared/schemas/job';

/** Parts through their last coat, as a bar and in words (the bar is decoration; the words carry it). */
export function JobProgress({ job }: { job: Pick<Job, 'partCount' | 'partsThrough'> }) {
  const share = job.partCount === 0 ? 0 : Math.min(1, job.partsThrough / job.partCount);
  return (
    <div className="min-w-28">
      <p className="whitespace-nowrap text-sm">
        {job.partCount === 0 ? 'No parts yet' : `${job.partsThrough} / ${job.partCount} parts`}
      </p>
      <div aria-hidden="true" className="mt-1 h-2 w-full overflow-hidden rounded-full bg-maple-200">
        <div className="h-full rounded-full bg-lacquer-500" style={{ width: `${Math.round(share * 100)}%` }} />
      </div>
    </div>
  );
}
