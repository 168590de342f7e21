import { can } from '../../../shared/permissions';
import { RacksPage } from '../../features/racks/components/racks-page';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function RacksForSite() {
  const user = useSignedInUser();
  const scope = useSiteScope(user);
  return (
    <RacksPage
      units={user.units}
      canWrite={can(user.role, 'racks:write')}
      siteId={scope.siteId}
      siteNames={scope.view?.names}
      siteChoice={scope.view?.choice}
      siteSwitcher={<SiteSwitcher scope={scope} />}
    />
  );
}

export function RacksRoute() {
  usePageTitle('Racks');
  return (
    <RequirePermission permission="racks:read">
      <RacksForSite />
    </RequirePermission>
  );
}
