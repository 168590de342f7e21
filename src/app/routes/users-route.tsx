import { can } from '../../../shared/permissions';
import { useShopSettings } from '../../api/settings/get-settings';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { UsersPage } from '../../features/users/components/users-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function UsersWithDefaults() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  // Users are listed across every site, so the switcher has no place here; the names and the form's choice do.
  const { view } = useSiteScope(user);
  return (
    <UsersPage
      currentUserId={user.id}
      canWrite={can(user.role, 'users:write')}
      defaultUnits={settings.data?.defaultUnits ?? 'metric'}
      siteNames={view?.names}
      siteChoice={view?.choice}
    />
  );
}

export function UsersRoute() {
  usePageTitle('Users');
  return (
    <RequirePermission permission="users:read">
      <UsersWithDefaults />
    </RequirePermission>
  );
}
