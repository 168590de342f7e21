import { Link } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { useJob } from '../../api/jobs/get-job';
import { EstimatePanel } from '../../features/jobs/components/estimate-panel';
import { JobOverview } from '../../features/jobs/components/job-overview';
import { JobReadyTime } from '../../features/jobs/components/job-ready-time';
import { PartsSection } from '../../features/parts/components/parts-section';
import { useRacks } from '../../api/racks/get-racks';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useShopTimeZone } from '../use-shop-time-zone';
import { useShopToday } from '../use-shop-today';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

function BackToJobs() {
  return (
    <Link to="/jobs" className="mb-2 inline-flex min-h-touch items-center font-semibold text-lacquer-800 underline-offset-4 hover:underline print:hidden">
      <span aria-hidden="true">←&nbsp;</span>All jobs
    </Link>
  );
}

function JobView({ jobId }: { jobId: number }) {
  const user = useSignedInUser();
  const canWrite = can(user.role, 'jobs:write');
  const shopToday = useShopToday();
  const timeZone = useShopTimeZone();
  const job = useJob(jobId);
  const racks = useRacks({ page: 1, pageSize: 200 });
  usePageTitle(job.data ? `Job ${job.data.reference}` : 'Job');

  if (job.isPending) return <LoadingState what="the job" />;
  if (job.isError) return <ErrorState error={job.error} what="the job" onRetry={() => job.refetch()} />;
  const tagsLink = (
    <Link to={`/jobs/${jobId}/tags`} className={buttonClasses('secondary')}>
      Rack tags
    </Link>
  );
  const importLink = canWrite && (
    <Link to={`/jobs/${jobId}/import`} className={buttonClasses('secondary')}>
      Import cut list
    </Link>
  );
  return (
    <>
      <JobOverview job={job.data} units={user.units} shopToday={shopToday} canWrite={canWrite} actions={tagsLink} />
      {timeZone && job.data.state !== 'cancelled' && <JobReadyTime jobId={jobId} timeZone={timeZone} units={user.units} />}
      <PartsSection jobId={jobId} units={user.units} canWrite={canWrite} racks={racks.data?.items} actions={importLink} />
      <EstimatePanel jobId={jobId} units={user.units} />
    </>
  );
}

export function JobRoute() {
  const jobId = useIdParam();
  if (jobId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="jobs:read">
      <BackToJobs />
      <JobView jobId={jobId} />
    </RequirePermission>
  );
}
