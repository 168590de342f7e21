import { Router } from 'express';
import { AppError } from '../lib/app-error';
import type { NotificationRuntime } from '../mail/notifications-runtime';
import { requirePermission, requireSignIn } from '../middleware/permissions';

export function notificationRoutes(runtime: NotificationRuntime | undefined): Router {
  const router = Router();
  router.get('/notifications', requireSignIn, async (req, res) => {
    res.json({ items: runtime ? await runtime.service.recentFor(req.user!.id) : [] });
  });
  // The development mailbox: what the fake SMTP server received. Absent when real SMTP is set.
  router.get('/mailbox', requirePermission('users:read'), (_req, res) => {
    if (!runtime?.mailbox) throw new AppError('not_found', 'There is no development mailbox: e-mail goes out through SMTP_URL');
    res.json({ items: runtime.mailbox.messages, total: runtime.mailbox.messages.length, page: 1, pageSize: runtime.mailbox.messages.length });
  });
  return router;
}
