import { can } from '../../../shared/permissions';
import { calendarDateIn } from '../../../shared/time';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { CrewPersonPage } from '../../features/crew/components/crew-person-page';
import { useShopSettings } from '../../api/settings/get-settings';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useIdParam } from './id-param';
import { NotFoundRoute } from './not-found-route';

function CrewPerson({ userId }: { userId: number }) {
  const user = useSignedInUser();
  const settings = useShopSettings();
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  return (
    <CrewPersonPage
      userId={userId}
      isSelf={userId === user.id}
      canRecord={can(user.role, 'crew:write')}
      canListCrew={can(user.role, 'crew:status')}
      today={calendarDateIn(new Date(), settings.data.timezone)}
      intervals={settings.data}
    />
  );
}

export function CrewPersonRoute() {
  usePageTitle('Crew records');
  const userId = useIdParam('userId');
  if (userId === null) return <NotFoundRoute />;
  return (
    <RequirePermission permission="crew:own">
      <CrewPerson key={userId} userId={userId} />
    </RequirePermission>
  );
}
