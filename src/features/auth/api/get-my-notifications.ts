import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { notificationSchema } from '../../../../shared/schemas/notification';
import { apiClient } from '../../../lib/api-client';
import { myNotificationKeys } from './auth-keys';

const myNotificationsSchema = z.object({ items: z.array(notificationSchema) });

/** The signed-in user's last 50 notifications, newest first, sent or still waiting. */
export async function getMyNotifications(signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/notifications', myNotificationsSchema, { signal });
  return items;
}

export const myNotificationsQueryOptions = () =>
  queryOptions({
    queryKey: myNotificationKeys.recent(),
    queryFn: ({ signal }) => getMyNotifications(signal),
    refetchInterval: 60_000,
  });

export function useMyNotifications() {
  return useQuery(myNotificationsQueryOptions());
}
