import { calendarDateIn } from '../../../shared/time';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { ReportsPage } from '../../features/reports/components/reports-page';
import { useShopSettings } from '../../api/settings/get-settings';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function ReportsWithSettings() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  const scope = useSiteScope(user);
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  // The shop's name, timezone and calendar decide the ranges and the printed heading.
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  const { shopName, timezone } = settings.data;
  const siteName = scope.siteId ? scope.view?.sites.find((s) => s.id === scope.siteId)?.name : undefined;
  return (
    <ReportsPage
      shopName={siteName ? `${shopName} · ${siteName}` : shopName}
      timeZone={timezone}
      today={calendarDateIn(new Date(), timezone)}
      units={user.units}
      siteId={scope.siteId}
      siteSwitcher={<SiteSwitcher scope={scope} />}
    />
  );
}

export function ReportsRoute() {
  usePageTitle('Reports');
  return (
    <RequirePermission permission="reports:read">
      <ReportsWithSettings />
    </RequirePermission>
  );
}
