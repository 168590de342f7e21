import { useSearchParams } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { PlannerPage } from '../../features/planner/components/planner-page';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

/** The planner needs the shop's clock and planning minutes before it can draw a single slot. */
function PlannerWithSettings() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  const scope = useSiteScope(user);
  // A link from the day's board may name the day to open on (?day=YYYY-MM-DD).
  const [params] = useSearchParams();
  const day = params.get('day') ?? '';
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  const { timezone, setupMin, cleanDownMin } = settings.data;
  const viewer = { id: user.id, name: user.name, canWrite: can(user.role, 'spray-sessions:write'), canReadProducts: can(user.role, 'products:read'), canReadUpkeep: can(user.role, 'upkeep:read') };
  return (
    <PlannerPage
      settings={{ timezone, setupMin, cleanDownMin }}
      viewer={viewer}
      siteId={scope.siteId}
      initialDay={/^\d{4}-\d{2}-\d{2}$/.test(day) ? day : undefined}
      siteSwitcher={<SiteSwitcher scope={scope} />}
    />
  );
}

export function PlannerRoute() {
  usePageTitle('Booth planner');
  return (
    <RequirePermission permission="spray-sessions:read">
      <PlannerWithSettings />
    </RequirePermission>
  );
}
