import { Cron } from 'croner';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config/env';
import { createNotificationService, type NotificationService } from '../services/notifications';
import { createSettingsService } from '../services/settings';
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
  const service = createNotificationService(dataSource, createSettingsService(dataSource), mailer, { recoatWarningHours: config.recoatWarningHours });
  // protect: a slow tick is never overlapped by the next one, so nothing is sent twice by this process.
  const job = options.schedule
    ? new Cron('0 * * * * *', { protect: true }, async () => {
        try {
          await service.tick(new Date());
        } catch (error) {
          logger.error({ err: error }, 'notification tick failed');
        }
      })
    : null;
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
