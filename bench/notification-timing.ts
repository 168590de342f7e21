import { monitorEventLoopDelay } from 'node:perf_hooks';
import { openDataSource } from '../server/db/data-source';
import { openSiteData } from '../server/data/site-data';
import { everySite } from '../server/lib/site-scope';
import type { Mailer } from '../server/mail/mailer';
import { createNotificationService } from '../server/services/notifications';
import { createSettingsService } from '../server/services/settings';

export interface TickTiming {
  /** The first tick after start: it looks back a whole day. */
  firstMs: number;
  /** The ticks after it, a minute apart on the shop's clock. */
  medianMs: number;
  maxMs: number;
  /** The longest the event loop was held at once during the later ticks. */
  longestStallMs: number;
  ticks: number;
}

const noMail: Mailer = { send: async () => undefined, close: () => undefined };

/** Times the scheduler's once-a-minute check as the server runs it, on a copy of the bench database. */
export async function timeNotificationTicks(databasePath: string, now: Date, ticks = 10): Promise<TickTiming> {
  const dataSource = await openDataSource({ kind: 'sqlite', path: databasePath }, { migrate: false });
  try {
    const data = openSiteData(dataSource, everySite);
    const service = createNotificationService(data, createSettingsService(data), noMail, { recoatWarningHours: 2, publicUrl: 'http://localhost:3000' });
    const times: number[] = [];
    const stalls = monitorEventLoopDelay({ resolution: 5 });
    for (let i = 0; i <= ticks; i++) {
      if (i === 1) stalls.enable();
      const started = performance.now();
      await service.tick(new Date(now.getTime() + i * 60_000));
      times.push(performance.now() - started);
    }
    stalls.disable();
    const later = times.slice(1).sort((a, b) => a - b);
    return { firstMs: times[0], medianMs: later[Math.floor(later.length / 2)], maxMs: later.at(-1)!, longestStallMs: stalls.max / 1e6, ticks };
  } finally {
    await dataSource.destroy();
  }
}
