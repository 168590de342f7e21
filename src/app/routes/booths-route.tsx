import { can } from '../../../shared/permissions';
import { BoothsPage } from '../../features/booths/components/booths-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';

export function BoothsRoute() {
  usePageTitle('Booths');
  const user = useSessionUser();
  return (
    <RequirePermission permission="booths:read">
      <BoothsPage units={user.units} canWrite={can(user.role, 'booths:write')} />
    </RequirePermission>
  );
}
