import { can } from '../../../shared/permissions';
import { JobsPage } from '../../features/jobs/components/jobs-page';
import { FindTagForm } from '../../features/parts/components/find-tag-form';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';
import { useShopToday } from '../use-shop-today';

export function JobsRoute() {
  usePageTitle('Jobs');
  const user = useSessionUser();
  const shopToday = useShopToday();
  return (
    <RequirePermission permission="jobs:read">
      <JobsPage units={user.units} canWrite={can(user.role, 'jobs:write')} shopToday={shopToday} aside={<FindTagForm />} />
    </RequirePermission>
  );
}
