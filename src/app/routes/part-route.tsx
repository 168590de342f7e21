import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { jobQueryOptions } from '../../api/jobs/get-job';
import { usePart } from '../../api/parts/get-part';
import { usePartHistory } from '../../api/parts/get-part-history';
import { PartHistorySection, PartNow } from '../../features/parts/components/part-history';
import { PartPage } from '../../features/parts/components/part-page';
import { useRacks } from '../../api/racks/get-racks';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useShopTimeZone } from '../use-shop-time-zone';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

function JobLine({ jobId }: { jobId: number }) {
  const job = useQuery(jobQueryOptions(jobId));
  const name = job.data ? `Job ${job.data.reference}` : 'Its job';
  return (
    <p>
      <Link to={`/jobs/${jobId}`} className="inline-flex min-h-touch items-center font-semibold text-lacquer-800 underline underline-offset-4">
        {name}
      </Link>
      {job.data && <span>, {job.data.customer}{job.data.finishSystemName ? ` · ${job.data.finishSystemName}` : ''}</span>}
    </p>
  );
}

function PartView({ partId }: { partId: number }) {
  const user = useSignedInUser();
  const part = usePart(partId);
  const racks = useRacks({ page: 1, pageSize: 200 });
  const timeZone = useShopTimeZone();
  const readsReady = can(user.role, 'ready:read');
  const history = usePartHistory(partId, readsReady);
  usePageTitle(part.data ? `Part ${part.data.label}` : 'Part');
  if (part.isPending) return <LoadingState what="the part" />;
  if (part.isError) return <ErrorState error={part.error} what="the part" onRetry={() => part.refetch()} />;
  return (
    <>
      <PartPage
        part={part.data}
        units={user.units}
        canWrite={can(user.role, 'jobs:write')}
        racks={racks.data?.items}
        job={<JobLine jobId={part.data.jobId} />}
        stateNow={history.data?.readiness.state}
        status={timeZone && readsReady ? <PartNow partId={partId} units={user.units} timeZone={timeZone} /> : null}
      />
      {timeZone && readsReady && <PartHistorySection partId={partId} units={user.units} timeZone={timeZone} />}
    </>
  );
}

export function PartRoute() {
  const partId = useIdParam();
  if (partId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="jobs:read">
      <PartView partId={partId} />
    </RequirePermission>
  );
}
