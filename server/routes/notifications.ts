import { mailboxSchema, myNotificationsSchema } from '../../shared/schemas/notification';
import { defineRoute, type ApiRoute } from '../registry/route';

export const notificationRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/notifications',
    summary: 'The signed-in user’s recent e-mail notifications',
    access: 'signed-in',
    sites: 'own',
    response: { status: 200, schema: myNotificationsSchema },
    handler: async (_input, { services, user }) => ({ items: await services.notifications.recentFor(user!.id) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/mailbox',
    summary: 'The development mailbox: what the local fake SMTP server received (404 when real SMTP is set)',
    access: 'users:read',
    sites: 'own',
    response: { status: 200, schema: mailboxSchema },
    handler: (_input, { services }) => services.notifications.mailbox(),
  }),
];
