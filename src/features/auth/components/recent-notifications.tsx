import type { Notification } from '../../../../shared/schemas/notification';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { formatShopDateTime, shopZoneName } from '../../../lib/shop-time';
import { useMyNotifications } from '../../../api/notifications/get-my-notifications';

function when(iso: string, timeZone: string): string {
  return `${formatShopDateTime(iso, timeZone)} ${shopZoneName(new Date(iso), timeZone)}`;
}

function NotificationRow({ notification, timeZone }: { notification: Notification; timeZone: string }) {
  const sent = notification.sentAt !== null;
  return (
    <li className="flex flex-wrap items-start justify-between gap-x-4 gap-y-1 px-4 py-3">
      <div className="min-w-0">
        <p className="font-medium break-words">{notification.subject}</p>
        <p className="text-sm text-maple-700">Due {when(notification.dueAt, timeZone)}</p>
      </div>
      <p className={sent ? 'text-sm text-maple-800' : 'rounded-panel border border-dashed border-maple-400 px-2 text-sm font-medium text-maple-900'}>
        {sent ? `Sent ${when(notification.sentAt!, timeZone)}` : 'Waiting to send'}
      </p>
    </li>
  );
}

/**
 * What the app has e-mailed this user lately. Times show in `timeZone` when the page passes the
 * shop's; otherwise in the device's, with the zone's name beside every time so neither is mistaken.
 */
export function RecentNotifications({ timeZone }: { timeZone?: string }) {
  const notifications = useMyNotifications();
  const zone = timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  return (
    <section aria-labelledby="recent-notifications-heading" className="max-w-xl">
      <h2 id="recent-notifications-heading" className="mb-1 text-xl font-bold text-lacquer-900">
        Recent notifications
      </h2>
      <p className="mb-3 text-sm text-maple-700">The last 50 e-mails the app has sent you or is about to, newest first.</p>
      {notifications.isPending ? (
        <LoadingState what="your notifications" />
      ) : notifications.isError ? (
        <ErrorState error={notifications.error} what="your notifications" onRetry={() => notifications.refetch()} />
      ) : notifications.data.length === 0 ? (
        <EmptyState title="Nothing yet">E-mails about the kinds ticked above will be listed here as they go out.</EmptyState>
      ) : (
        <ul className="divide-y divide-maple-200 rounded-panel border border-maple-300 bg-white">
          {notifications.data.map((notification) => (
            <NotificationRow key={notification.id} notification={notification} timeZone={zone} />
          ))}
        </ul>
      )}
    </section>
  );
}
