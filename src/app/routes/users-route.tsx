import { can } from '../../../shared/permissions';
import { useShopSettings } from '../../features/settings/api/get-settings';
import { UsersPage } from '../../features/users/components/users-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';

function UsersWithDefaults() {
  const user = useSessionUser();
  const settings = useShopSettings();
  return <UsersPage currentUserId={user.id} canWrite={can(user.role, 'users:write')} defaultUnits={settings.data?.defaultUnits ?? 'metric'} />;
}

export function UsersRoute() {
  usePageTitle('Users');
  return (
    <RequirePermission permission="users:read">
      <UsersWithDefaults />
    </RequirePermission>
  );
}
