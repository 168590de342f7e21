import { Cron } from 'croner';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config/env';
import { advisoryLocks, withAdvisoryLock } from '../db/advisory-lock';
import { createNotificationService, type NotificationService } from '../services/notifications';
import { createSettingsService } from '../services/settings';
import { openSiteData } from '../data/site-data';
import { everySite } from '../lib/site-scope';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp';
import { createMailer } from './mailer';

export interface NotificationRuntime {
  service: NotificationService;
  mailbox: FakeSmtp | null;
  stop(): Promise<void>;
}

/** Mail transport (real SMTP_URL or the local fake) and the once-a-minute scheduler. */
export async function startNotifications(dataSource: DataSource, config: AppConfig, logger: Logger, options: { schedule: boolean }): Promise<NotificationRuntime> {
  const mailbox = config.smtpUrl ? null : await startFakeSmtp(config.fakeSmtpPort).catch((error: NodeJS.ErrnoException) => {
    // A second app on this machine (a test server, say) must not fail for want of the usual port.
    if (error.code !== 'EADDRINUSE') throw error;
    return startFakeSmtp(0);
  });
  if (mailbox) logger.info({ port: mailbox.port }, 'no SMTP_URL: e-mail goes to the development mailbox (Settings → Mailbox)');
  const mailer = createMailer(config.smtpUrl ? { url: config.smtpUrl } : { port: mailbox!.port }, config.mailFrom);
  // The scheduler decides for every site; each rule sends a site's news to that site's people.
  const data = openSiteData(dataSource, everySite);
  const service = createNotificationService(data, createSettingsService(data), mailer, { recoatWarningHours: config.recoatWarningHours, publicUrl: config.publicUrl });
  // protect: a slow tick is never overlapped by the next one, so nothing is sent twice by this process.
  const job = options.schedule ? new Cron(config.notificationSchedule, { protect: true }, () => scheduledTick(dataSource, service, logger)) : null;
  return {
    service,
    mailbox,
    stop: async () => {
      job?.stop();
      mailer.close();
      await mailbox?.close();
    },
  };
}

/**
 * One tick of the scheduler. With several instances on PostgreSQL only the one that gets the
 * advisory lock sends; the others skip this tick. What the holder leaves unsent (it died, the
 * mail server was down) is still owed in the notifications table and goes out on a later tick.
 */
async function scheduledTick(dataSource: DataSource, service: NotificationService, logger: Logger): Promise<void> {
  try {
    const outcome = await withAdvisoryLock(dataSource, advisoryLocks.notificationTick, { wait: false }, () => service.tick(new Date()));
    logger.debug(outcome.held ? { sent: outcome.value.sent } : { skipped: 'another instance is sending' }, 'notification tick');
  } catch (error) {
    logger.error({ err: error }, 'notification tick failed');
  }
}
