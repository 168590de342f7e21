import { SitesPage } from '../../features/sites/components/sites-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSessionUser } from '../session-user';

function SitesForOwner() {
  const user = useSessionUser();
  return <SitesPage homeSiteId={user.siteId} />;
}

export function SitesRoute() {
  usePageTitle('Sites');
  return (
    <RequirePermission permission="sites:write">
      <SitesForOwner />
    </RequirePermission>
  );
}
