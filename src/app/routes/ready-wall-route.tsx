import { WallBoard } from '../../features/ready-board/components/wall-board';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useShopTimeZone } from '../use-shop-time-zone';

function WallWithClock() {
  const timeZone = useShopTimeZone();
  if (!timeZone) {
    return (
      <p role="status" className="p-8 text-3xl font-semibold text-maple-900">
        Loading the ready board…
      </p>
    );
  }
  return <WallBoard timeZone={timeZone} />;
}

/** Outside the app shell: a screen on the workshop wall needs no navigation. */
export function ReadyWallRoute() {
  usePageTitle('Ready board wall');
  return (
    <RequirePermission permission="ready:read">
      <WallWithClock />
    </RequirePermission>
  );
}
