import { can } from '../../../shared/permissions';
import { RacksPage } from '../../features/racks/components/racks-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';

export function RacksRoute() {
  usePageTitle('Racks');
  const user = useSessionUser();
  return (
    <RequirePermission permission="racks:read">
      <RacksPage units={user.units} canWrite={can(user.role, 'racks:write')} />
    </RequirePermission>
  );
}
