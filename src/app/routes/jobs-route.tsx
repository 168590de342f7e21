import { can } from '../../../shared/permissions';
import { JobsPage } from '../../features/jobs/components/jobs-page';
import { FindTagForm } from '../../features/parts/components/find-tag-form';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useShopToday } from '../use-shop-today';

export function JobsRoute() {
  usePageTitle('Jobs');
  const user = useSignedInUser();
  const shopToday = useShopToday();
  return (
    <RequirePermission permission="jobs:read">
      <JobsPage units={user.units} canWrite={can(user.role, 'jobs:write')} shopToday={shopToday} aside={<FindTagForm />} />
    </RequirePermission>
  );
}
