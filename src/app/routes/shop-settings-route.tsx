import { can } from '../../../shared/permissions';
import { PageHeader } from '../../components/ui/page-header';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useShopSettings } from '../../api/settings/get-settings';
import { ShopSettingsForm } from '../../features/settings/components/shop-settings-form';
import { ShopSettingsSummary } from '../../features/settings/components/shop-settings-summary';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

function ShopSettingsContent() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  const canEdit = can(user.role, 'settings:write');
  return (
    <>
      <PageHeader
        title="Shop settings"
        description={canEdit ? 'Apply to everyone in the shop.' : 'These apply to everyone in the shop. Only the owner can change them.'}
      />
      {settings.isPending ? (
        <LoadingState what="the shop settings" />
      ) : settings.isError ? (
        <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />
      ) : canEdit ? (
        <ShopSettingsForm settings={settings.data} />
      ) : (
        <ShopSettingsSummary settings={settings.data} units={user.units} />
      )}
    </>
  );
}

export function ShopSettingsRoute() {
  usePageTitle('Shop settings');
  return (
    <RequirePermission permission="settings:read">
      <ShopSettingsContent />
    </RequirePermission>
  );
}
