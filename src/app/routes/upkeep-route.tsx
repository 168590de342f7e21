import { useSearchParams } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { calendarDateIn } from '../../../shared/time';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { UpkeepPage } from '../../features/upkeep/components/upkeep-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

/** The booth looked at lives in the address (`?booth=`), so a link can point at one booth's record. */
function UpkeepForSite() {
  const user = useSignedInUser();
  const scope = useSiteScope(user);
  const settings = useShopSettings();
  const [params, setParams] = useSearchParams();
  const boothId = Number(params.get('booth')) || undefined;
  const chooseBooth = (id: number) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        next.set('booth', String(id));
        return next;
      },
      { replace: true },
    );
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  const timeZone = settings.data.timezone;
  return (
    <UpkeepPage
      boothId={boothId}
      onBooth={chooseBooth}
      timeZone={timeZone}
      today={calendarDateIn(new Date(), timeZone)}
      canLog={can(user.role, 'upkeep:log')}
      canWrite={can(user.role, 'upkeep:write')}
      siteId={scope.siteId}
      siteSwitcher={<SiteSwitcher scope={scope} />}
    />
  );
}

export function UpkeepRoute() {
  usePageTitle('Booth upkeep');
  return (
    <RequirePermission permission="upkeep:read">
      <UpkeepForSite />
    </RequirePermission>
  );
}
