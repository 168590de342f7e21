import { MailboxPage } from '../../features/mailbox/components/mailbox-page';
import { LoadingState } from '../../components/ui/states';
import { usePageTitle } from '../../lib/use-page-title';
import { RequirePermission } from '../require-permission';
import { useShopTimeZone } from '../use-shop-time-zone';

function MailboxInShopTime() {
  const timeZone = useShopTimeZone();
  if (!timeZone) return <LoadingState what="the mailbox" />;
  return <MailboxPage timeZone={timeZone} />;
}

export function MailboxRoute() {
  usePageTitle('Mailbox');
  return (
    <RequirePermission permission="users:read">
      <MailboxInShopTime />
    </RequirePermission>
  );
}
