import type { Job } from '../../../../shared/schemas/job';
import { dueWords } from './job-format';

export function DueDate({ job, shopToday }: { job: Pick<Job, 'dueDate' | 'state'>; shopToday: string }) {
  const due = dueWords(job, shopToday);
  return (
    <span className="block whitespace-nowrap">
      {due.date}
      {due.relation && (
        <span className={`block text-sm ${due.overdue ? 'font-semibold text-verdict-stop' : 'text-maple-700'}`}>
          {due.overdue && <span aria-hidden="true">⚠ </span>}
          {due.relation}
        </span>
      )}
    </span>
  );
}
