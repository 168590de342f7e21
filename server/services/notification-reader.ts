import type { Notification } from '../../shared/schemas/notification';
import { AppError } from '../lib/app-error';
import type { NotificationRuntime } from '../mail/notifications-runtime';

/** What a user reads of the e-mail side: their own recent notifications, and (for admins) the development mailbox. */
export function createNotificationReader(runtime: NotificationRuntime | undefined) {
  return {
    recentFor: async (userId: number): Promise<Notification[]> => (runtime ? runtime.service.recentFor(userId) : []),

    /** What the fake SMTP server received; absent when real SMTP is set. */
    mailbox() {
      if (!runtime?.mailbox) throw new AppError('not_found', 'There is no development mailbox: e-mail goes out through SMTP_URL');
      const items = runtime.mailbox.messages;
      return { items, total: items.length, page: 1, pageSize: items.length };
    },
  };
}

export type NotificationReader = ReturnType<typeof createNotificationReader>;
