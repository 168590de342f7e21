import { lazy, Suspense } from 'react';
import { LoadingState, ErrorState } from '../../components/ui/states';
import { useBooths } from '../../api/booths/get-booths';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

const CalculatorPage = lazy(() => import('../../features/calculator/components/calculator-page').then((module) => ({ default: module.CalculatorPage })));

/** All booths in one page: the calculator lets the user pick one. */
const allBooths = { page: 1, pageSize: 200 };

function CalculatorWithBooths() {
  const user = useSignedInUser();
  const booths = useBooths(allBooths);
  if (booths.isPending) return <LoadingState what="the booths for the calculator" />;
  if (booths.isError) return <ErrorState error={booths.error} what="the booths" onRetry={() => booths.refetch()} />;
  return (
    <Suspense fallback={<LoadingState what="the calculator" />}>
      <CalculatorPage units={user.units} booths={booths.data.items} />
    </Suspense>
  );
}

export function CalculatorRoute() {
  usePageTitle('Calculator');
  return (
    <RequirePermission permission="calculator:use">
      <CalculatorWithBooths />
    </RequirePermission>
  );
}
