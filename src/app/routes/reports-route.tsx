import { calendarDateIn } from '../../../shared/time';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { ReportsPage } from '../../features/reports/components/reports-page';
import { useShopSettings } from '../../features/settings/api/get-settings';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';

function ReportsWithSettings() {
  const user = useSessionUser();
  const settings = useShopSettings();
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  // The shop's name, timezone and calendar decide the ranges and the printed heading.
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  const { shopName, timezone } = settings.data;
  return <ReportsPage shopName={shopName} timeZone={timezone} today={calendarDateIn(new Date(), timezone)} units={user.units} />;
}

export function ReportsRoute() {
  usePageTitle('Reports');
  return (
    <RequirePermission permission="reports:read">
      <ReportsWithSettings />
    </RequirePermission>
  );
}
