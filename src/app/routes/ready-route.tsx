import { can } from '../../../shared/permissions';
import { LoadingState } from '../../components/ui/states';
import { ReadyBoardPage } from '../../features/ready-board/components/ready-board-page';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useSignedInUser } from '../signed-in-user';
import { useShopTimeZone } from '../use-shop-time-zone';

function ReadyBoardWithClock() {
  const user = useSignedInUser();
  const timeZone = useShopTimeZone();
  if (!timeZone) return <LoadingState what="the ready board" />;
  return <ReadyBoardPage timeZone={timeZone} units={user.units} canCollect={can(user.role, 'parts:collect')} />;
}

export function ReadyRoute() {
  usePageTitle('Ready board');
  return (
    <RequirePermission permission="ready:read">
      <ReadyBoardWithClock />
    </RequirePermission>
  );
}
