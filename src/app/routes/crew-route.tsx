import { Navigate } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { CrewPage } from '../../features/crew/components/crew-page';
import { SiteSwitcher } from '../../features/sites/components/site-switcher';
import { useSiteScope } from '../../features/sites/hooks/use-site-scope';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function CrewList() {
  const user = useSignedInUser();
  const scope = useSiteScope(user);
  return <CrewPage viewerId={user.id} seesDetails={can(user.role, 'crew:write')} siteId={scope.siteId} siteSwitcher={<SiteSwitcher scope={scope} />} />;
}

/** The owner and a lead see the whole crew's status; everyone else goes straight to their own records. */
export function CrewRoute() {
  usePageTitle('Crew records');
  const user = useSignedInUser();
  if (can(user.role, 'crew:own') && !can(user.role, 'crew:status')) return <Navigate to={`/crew/${user.id}`} replace />;
  return (
    <RequirePermission permission="crew:status">
      <CrewList />
    </RequirePermission>
  );
}
