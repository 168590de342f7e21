import { can } from '../../../shared/permissions';
import type { CoatingProducts } from '../../features/finish-systems/components/coating-products';
import { FinishSystemsPage } from '../../features/finish-systems/components/finish-systems-page';
import { useProducts } from '../../api/products/get-products';
import { useShopSettings } from '../../api/settings/get-settings';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

// The server's largest page; a shop with more coatings than this would need a product search in the step editor.
const allProducts = { sort: 'name', dir: 'asc', page: 1, pageSize: 200 } as const;

/** Composes two features: the systems, and the data sheets their totals are worked out from. */
export function FinishSystemsRoute() {
  usePageTitle('Finish systems');
  const user = useSignedInUser();
  const settings = useShopSettings();
  const canReadProducts = can(user.role, 'products:read');
  const products = useProducts(allProducts, { enabled: canReadProducts });

  const coating: CoatingProducts = !canReadProducts
    ? { status: 'not-allowed' }
    : products.isError
      ? { status: 'error', error: products.error, retry: () => products.refetch() }
      : products.data
        ? { status: 'ready', products: products.data.items }
        : { status: 'loading' };

  return (
    <RequirePermission permission="finish-systems:read">
      <FinishSystemsPage
        key={settings.data ? 'settings' : 'default'}
        units={user.units}
        canWrite={can(user.role, 'finish-systems:write')}
        coating={coating}
        planningTempC={settings.data?.planningDryingTempC ?? 20}
      />
    </RequirePermission>
  );
}
