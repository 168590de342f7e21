import { Navigate, useLocation } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { TodayPage } from '../../features/today/components/today-page';
import { usePageTitle } from '../../lib/use-page-title';
import { useSignedInUser } from '../signed-in-user';

function TodayBoard() {
  usePageTitle('Today');
  const user = useSignedInUser();
  const settings = useShopSettings();
  const scope = useSiteScope(user);
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  return <TodayPage user={user} settings={settings.data} siteId={scope.siteId} siteSwitcher={<SiteSwitcher scope={scope} />} />;
}

/** Everyone lands here; an assembler's day is the ready board, so they go straight to it. */
export function TodayRoute() {
  const user = useSignedInUser();
  const location = useLocation();
  // Keyed by the visit: signing in can land here twice in a row, and a second landing must send them on again.
  if (!can(user.role, 'today:read')) return <Navigate key={location.key} to="/ready" replace />;
  return <TodayBoard />;
}
