import { NewProductPage } from '../../features/products/components/new-product-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';

export function NewProductRoute() {
  usePageTitle('New data sheet');
  return (
    <RequirePermission permission="products:write">
      <NewProductPage />
    </RequirePermission>
  );
}
