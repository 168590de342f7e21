import { can } from '../../../shared/permissions';
import { BoothsPage } from '../../features/booths/components/booths-page';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function BoothsForSite() {
  const user = useSignedInUser();
  const scope = useSiteScope(user);
  return (
    <BoothsPage
      units={user.units}
      canWrite={can(user.role, 'booths:write')}
      siteId={scope.siteId}
      siteNames={scope.view?.names}
      siteChoice={scope.view?.choice}
      siteSwitcher={<SiteSwitcher scope={scope} />}
    />
  );
}

export function BoothsRoute() {
  usePageTitle('Booths');
  return (
    <RequirePermission permission="booths:read">
      <BoothsForSite />
    </RequirePermission>
  );
}
