import { useCallback, useState, type ReactNode } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { jobStateSchema } from '../../../../shared/schemas/job';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useJobs } from '../../../api/jobs/get-jobs';
import type { JobStateFilter } from './job-format';
import { JobForm } from './job-form';
import { JobsFilters } from './jobs-filters';
import { JobsTable } from './jobs-table';

const pageSize = 50;

interface JobsPageProps {
  units: UnitSystem;
  canWrite: boolean;
  shopToday: string;
  /** Tools from other features shown beside the list (the tag finder). */
  aside?: ReactNode;
}

/** Filters live in the address, so "back" from a job returns to the same list. */
function useJobFilters() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q') ?? '';
  const raw = params.get('state');
  const parsedState = jobStateSchema.safeParse(raw);
  const state: JobStateFilter = raw === 'active' ? 'active' : parsedState.success ? parsedState.data : '';
  const page = Math.max(1, Number(params.get('page')) || 1);
  const set = useCallback(
    (next: { q?: string; state?: string; page?: number }) =>
      setParams((current) => {
        const merged = new URLSearchParams(current);
        for (const [key, value] of Object.entries(next)) if (value) merged.set(key, String(value)); else merged.delete(key);
        return merged;
      }, { replace: true }),
    [setParams],
  );
  return { q, state, page, set };
}

export function JobsPage({ units, canWrite, shopToday, aside }: JobsPageProps) {
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const filters = useJobFilters();
  const { set } = filters;
  const jobs = useJobs({ q: filters.q || undefined, state: filters.state || undefined, page: filters.page, pageSize });
  const onFilter = useCallback((next: { q: string; state: string }) => set({ ...next, page: undefined }), [set]);
  const filtered = Boolean(filters.q || filters.state);

  return (
    <>
      <PageHeader
        title="Jobs"
        description="Every batch coming through the booth, soonest due first. Open a job for its parts, rack tags and material estimate."
        actions={canWrite && <Button onClick={() => setAdding(true)}>Add job</Button>}
      />
      <div className="mb-5 grid items-start gap-x-8 gap-y-4 xl:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <JobsFilters q={filters.q} state={filters.state} onChange={onFilter} />
        {aside}
      </div>
      {jobs.isPending ? (
        <LoadingState what="jobs" />
      ) : jobs.isError ? (
        <ErrorState error={jobs.error} what="the jobs" onRetry={() => jobs.refetch()} />
      ) : jobs.data.items.length === 0 ? (
        <EmptyState title={filtered ? 'No jobs match' : 'No jobs yet'}>
          {filtered ? 'Try another search or state.' : canWrite ? 'Add the first job to start tracking its parts.' : 'The finishing lead or the owner adds jobs.'}
        </EmptyState>
      ) : (
        <>
          <JobsTable jobs={jobs.data.items} units={units} shopToday={shopToday} />
          <Pagination page={filters.page} pageSize={pageSize} total={jobs.data.total} noun="jobs" onPage={(page) => set({ page })} />
        </>
      )}
      {canWrite && (
        <Dialog open={adding} onClose={() => setAdding(false)} wide title="Add a job" description="The job’s parts are added on its own page, by hand or from a cut list.">
          <JobForm onDone={(saved) => (saved ? navigate(`/jobs/${saved.id}`) : setAdding(false))} />
        </Dialog>
      )}
    </>
  );
}
