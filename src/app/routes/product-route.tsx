import { useParams } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { idSchema } from '../../../shared/schemas/common';
import { ProductPage } from '../../features/products/components/product-page';
import { useShopSettings } from '../../api/settings/get-settings';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { NotFoundRoute } from './not-found-route';

// The shop's planning temperature is the natural first guess; 20 °C until settings have loaded.
const fallbackTempC = 20;

export function ProductRoute() {
  usePageTitle('Data sheet');
  const user = useSignedInUser();
  const settings = useShopSettings();
  const id = idSchema.safeParse(useParams().id);
  if (!id.success) return <NotFoundRoute />;
  return (
    <RequirePermission permission="products:read">
      <ProductPage
        id={id.data}
        units={user.units}
        timeZone={settings.data?.timezone ?? 'UTC'}
        planningTempC={settings.data?.planningDryingTempC ?? fallbackTempC}
        canWrite={can(user.role, 'products:write')}
      />
    </RequirePermission>
  );
}
