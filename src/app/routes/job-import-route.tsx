import { useNavigate } from 'react-router-dom';
import { useJob } from '../../api/jobs/get-job';
import { CsvImportPage } from '../../features/parts/components/csv-import-page';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

function ImportView({ jobId }: { jobId: number }) {
  const navigate = useNavigate();
  const job = useJob(jobId);
  usePageTitle(job.data ? `Import a cut list · ${job.data.reference}` : 'Import a cut list');
  if (job.isPending) return <LoadingState what="the job" />;
  if (job.isError) return <ErrorState error={job.error} what="the job" onRetry={() => job.refetch()} />;
  const imported = () => navigate(`/jobs/${jobId}`);
  return <CsvImportPage jobId={jobId} jobReference={job.data.reference} customer={job.data.customer} onImported={imported} />;
}

export function JobImportRoute() {
  const jobId = useIdParam();
  if (jobId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="jobs:write">
      <ImportView jobId={jobId} />
    </RequirePermission>
  );
}
