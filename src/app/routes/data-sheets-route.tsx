import { can } from '../../../shared/permissions';
import { useShopSettings } from '../../api/settings/get-settings';
import { DataSheetsPage } from '../../features/products/components/data-sheets-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

export function DataSheetsRoute() {
  usePageTitle('Data sheets');
  const user = useSignedInUser();
  const settings = useShopSettings();
  return (
    <RequirePermission permission="products:read">
      <DataSheetsPage units={user.units} timeZone={settings.data?.timezone ?? 'UTC'} canWrite={can(user.role, 'products:write')} />
    </RequirePermission>
  );
}
