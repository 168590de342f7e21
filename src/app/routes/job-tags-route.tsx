import { useJob } from '../../api/jobs/get-job';
import { TagSheetPage } from '../../features/parts/components/tag-sheet-page';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

function TagsView({ jobId }: { jobId: number }) {
  const job = useJob(jobId);
  usePageTitle(job.data ? `Rack tags · ${job.data.reference}` : 'Rack tags');
  if (job.isPending) return <LoadingState what="the job" />;
  if (job.isError) return <ErrorState error={job.error} what="the job" onRetry={() => job.refetch()} />;
  return <TagSheetPage jobId={jobId} jobReference={job.data.reference} customer={job.data.customer} origin={window.location.origin} />;
}

export function JobTagsRoute() {
  const jobId = useIdParam();
  if (jobId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="jobs:read">
      <TagsView jobId={jobId} />
    </RequirePermission>
  );
}
