import { useSearchParams } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { CoatLogPage } from '../../features/coat-log/components/coat-log-page';
import type { CoatLogFilterValues } from '../../features/coat-log/components/coat-log-filters';
import { useShopSettings } from '../../api/settings/get-settings';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';

const positive = (text: string | null) => {
  const n = Number(text);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

/** The filters and page live in the address, so a lead can send a filtered log to someone else. */
function useLogAddress() {
  const [params, setParams] = useSearchParams();
  const filters: CoatLogFilterValues = {
    jobId: positive(params.get('job')),
    productId: positive(params.get('product')),
    from: params.get('from') ?? '',
    to: params.get('to') ?? '',
    history: params.get('history') === 'true',
  };
  const change = (next: CoatLogFilterValues, page: number) => {
    const entries = { job: next.jobId, product: next.productId, from: next.from, to: next.to, history: next.history ? 'true' : '', page: page > 1 ? page : '' };
    setParams(Object.fromEntries(Object.entries(entries).flatMap(([key, value]) => (value ? [[key, String(value)]] : []))), { replace: true });
  };
  return { filters, page: positive(params.get('page')) ?? 1, change };
}

function CoatLogWithSettings() {
  const user = useSignedInUser();
  const settings = useShopSettings();
  const { filters, page, change } = useLogAddress();
  if (settings.isPending) return <LoadingState what="the shop settings" />;
  if (settings.isError) return <ErrorState error={settings.error} what="the shop settings" onRetry={() => settings.refetch()} />;
  return <CoatLogPage filters={filters} page={page} onChange={change} canCorrect={can(user.role, 'coats:write')} units={user.units} timeZone={settings.data.timezone} />;
}

export function CoatLogRoute() {
  usePageTitle('Coat log');
  return (
    <RequirePermission permission="coats:read">
      <CoatLogWithSettings />
    </RequirePermission>
  );
}
