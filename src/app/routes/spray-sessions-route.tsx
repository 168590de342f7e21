import { can } from '../../../shared/permissions';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { MySessionsPage } from '../../features/spray-session/components/my-sessions-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function SessionsWithSettings() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  return <MySessionsPage viewerId={user.id} seesAll={can(user.role, 'spray-sessions:write')} timeZone={settings.data.timezone} />;
}

export function SpraySessionsRoute() {
  usePageTitle('Spray sessions');
  return (
    <RequirePermission permission="spray-sessions:read">
      <SessionsWithSettings />
    </RequirePermission>
  );
}
