import { can } from '../../../shared/permissions';
import { useBooths } from '../../features/booths/api/get-booths';
import { useRacks } from '../../features/racks/api/get-racks';
import { useShopSettings } from '../../features/settings/api/get-settings';
import { TodayPage } from '../../features/today/components/today-page';
import { usePageTitle } from '../../lib/use-page-title';
import { useSessionUser } from '../session-user';

const firstPage = { page: 1, pageSize: 1 };

export function TodayRoute() {
  usePageTitle('Today');
  const user = useSessionUser();
  const settings = useShopSettings();
  const booths = useBooths(firstPage);
  const racks = useRacks(firstPage);
  const counts = {
    booths: can(user.role, 'booths:read') ? booths.data?.total : undefined,
    racks: can(user.role, 'racks:read') ? racks.data?.total : undefined,
  };
  return <TodayPage user={user} settings={settings.data} counts={counts} />;
}
