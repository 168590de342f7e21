import { SitesPage } from '../../features/sites/components/sites-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function SitesForOwner() {
  const user = useSignedInUser();
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
