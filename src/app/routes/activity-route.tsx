import { AuditPage } from '../../features/audit/components/audit-page';
import { useShopSettings } from '../../api/settings/get-settings';
import { LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';

function ActivityWithClock() {
  const settings = useShopSettings();
  if (settings.isPending) return <LoadingState what="the activity log" />;
  // Settings unreadable: times fall back to UTC rather than the page failing.
  return <AuditPage timeZone={settings.data?.timezone ?? 'UTC'} />;
}

export function ActivityRoute() {
  usePageTitle('Activity log');
  return (
    <RequirePermission permission="audit:read">
      <ActivityWithClock />
    </RequirePermission>
  );
}
