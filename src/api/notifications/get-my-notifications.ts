import { queryOptions, useQuery } from '@tanstack/react-query';
import { myNotificationsSchema } from '../../../shared/schemas/notification';
import { apiClient } from '../../lib/api-client';
import { notificationKeys } from './notification-keys';

/** The signed-in user's last 50 notifications, newest first, sent or still waiting. */
export async function getMyNotifications(signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/notifications', myNotificationsSchema, { signal });
  return items;
}

export const myNotificationsQueryOptions = () =>
  queryOptions({
    queryKey: notificationKeys.mine(),
    queryFn: ({ signal }) => getMyNotifications(signal),
    refetchInterval: 60_000,
  });

export function useMyNotifications() {
  return useQuery(myNotificationsQueryOptions());
}
