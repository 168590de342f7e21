import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { SpraySessionPage } from '../../features/spray-session/components/spray-session-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

/** Every time on the page is the shop's, so it waits for the shop's timezone. */
function SessionWithSettings({ sessionId }: { sessionId: number }) {
  const user = useSignedInUser();
  const settings = useShopSettings();
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  return <SpraySessionPage sessionId={sessionId} viewer={{ id: user.id, role: user.role }} units={user.units} timeZone={settings.data.timezone} />;
}

export function SpraySessionRoute() {
  usePageTitle('Spray session');
  const sessionId = useIdParam();
  if (sessionId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="spray-sessions:read">
      <SessionWithSettings sessionId={sessionId} />
    </RequirePermission>
  );
}
