import { openDataSource } from '../../server/db/data-source';
import { openSiteData } from '../../server/data/site-data';
import { everySite } from '../../server/lib/site-scope';
import type { Mailer } from '../../server/mail/mailer';
import { createNotificationService } from '../../server/services/notifications';
import { createSettingsService } from '../../server/services/settings';

// The shop has been running all along, so what fell due before now was sent at the time.
const alreadySent: Mailer = { send: async () => undefined, close: () => undefined };

/**
 * Runs the app's own notification check until nothing is owed. A live shop records its
 * notifications as they fall due; a bulk-loaded one would otherwise send a backlog of hundreds
 * of e-mails from inside the server during the first minutes of the measurements.
 */
export async function settleNotifications(databasePath: string, now: Date): Promise<number> {
  const dataSource = await openDataSource({ kind: 'sqlite', path: databasePath }, { migrate: false });
  try {
    const service = createNotificationService(openSiteData(dataSource, everySite), createSettingsService(openSiteData(dataSource, everySite)), alreadySent, { recoatWarningHours: 2, publicUrl: 'http://localhost:3000' });
    let total = 0;
    for (let sent = -1; sent !== 0; ) {
      sent = (await service.tick(now)).sent;
      total += sent;
    }
    return total;
  } finally {
    await dataSource.destroy();
  }
}
