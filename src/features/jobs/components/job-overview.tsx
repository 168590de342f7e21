import { useState, type ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Job } from '../../../../shared/schemas/job';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { formatQuantity } from '../../../lib/units-display';
import { DueDate } from './due-date';
import { JobForm } from './job-form';
import { JobProgress } from './job-progress';
import { JobStateBadge } from './job-state-badge';

interface JobOverviewProps {
  job: Job;
  units: UnitSystem;
  shopToday: string;
  canWrite: boolean;
  /** Links to the job's other pages, supplied by the route. */
  actions?: ReactNode;
}

function Detail({ term, children, wide = false }: { term: string; children: ReactNode; wide?: boolean }) {
  return (
    <div className={wide ? 'sm:col-span-2 lg:col-span-4' : ''}>
      <dt className="text-sm font-medium text-maple-700">{term}</dt>
      <dd className="mt-0.5">{children}</dd>
    </div>
  );
}

/** The job's heading, its details and (for lead and owner) the edit dialog. */
export function JobOverview({ job, units, shopToday, canWrite, actions }: JobOverviewProps) {
  const [editing, setEditing] = useState(false);
  return (
    <>
      <PageHeader
        title={`Job ${job.reference}`}
        description={job.customer}
        actions={
          <>
            {canWrite && (
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit job
              </Button>
            )}
            {actions}
          </>
        }
      />
      <dl className="mb-8 grid gap-4 rounded-panel border border-maple-300 bg-white p-4 sm:grid-cols-2 lg:grid-cols-4">
        <Detail term="Due">
          <DueDate job={job} shopToday={shopToday} />
        </Detail>
        <Detail term="State">
          <JobStateBadge state={job.state} />
          <span className="block text-sm text-maple-700">{job.stateSetBy === 'lead' ? 'Set by a lead' : 'Follows its parts’ coats and collections'}</span>
        </Detail>
        <Detail term="Finish system">{job.finishSystemName ?? <span className="text-maple-700">None chosen yet</span>}</Detail>
        <Detail term="Colour and sheen">
          {job.colour || 'No colour given'}
          <span className="block text-sm text-maple-700">{job.sheen || 'No sheen given'}</span>
        </Detail>
        <Detail term="Parts through the finish">
          <JobProgress job={job} />
        </Detail>
        <Detail term="Coated area, all parts">{formatQuantity('area', job.coatedAreaM2, units)}</Detail>
        {job.notes && (
          <Detail term="Notes" wide>
            <p className="whitespace-pre-line">{job.notes}</p>
          </Detail>
        )}
      </dl>
      {canWrite && (
        <Dialog open={editing} onClose={() => setEditing(false)} wide title={`Edit job ${job.reference}`}>
          <JobForm job={job} onDone={() => setEditing(false)} />
        </Dialog>
      )}
    </>
  );
}
