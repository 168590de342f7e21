import { IsNull } from 'typeorm';
import type { Notification } from '../../shared/schemas/notification';
import type { SiteData } from '../data/site-data';
import type { Mailer } from '../mail/mailer';
import type { UserEntity } from '../db/entities/user.entity';
import { notificationRules, type DueNotification } from './notification-rules';
import type { SettingsService } from './settings';
import { shopFormatOf } from '../../shared/words';

export interface NotificationOptions {
  recoatWarningHours: number;
  /** Where people open the app: e-mails link to the page they are about. */
  publicUrl: string;
}

/**
 * Each tick decides what is due from the data itself (so a notification that fell due while
 * the server was down is found on the next tick), records it once under its dedupe key, then
 * sends every recorded one not yet sent. It runs as the system, across every site (`data`).
 */
export function createNotificationService(data: SiteData, settings: SettingsService, mailer: Mailer, options: NotificationOptions) {
  const settled = new SettledCoats();

  async function record(due: DueNotification[]): Promise<void> {
    // ON CONFLICT DO NOTHING on the unique key: deciding twice records once.
    await data.notifications.insertNew(due.map((d) => ({ ...d, sentAt: null, lastError: null })));
  }

  async function sendOwed(): Promise<number> {
    const owed = await data.notifications.find({ where: { sentAt: IsNull() }, order: { id: 'ASC' }, take: 100 });
    const users = new Map((await data.users.find()).map((u) => [u.id, u]));
    let sent = 0;
    for (const n of owed) {
      const user = users.get(n.userId);
      try {
        if (user && !user.disabled) await mailer.send({ to: `${user.name} <${user.email}>`, subject: n.subject, text: n.body });
        // Only the first marking counts, so a sent time is never moved and each send is counted once.
        const marked = await data.notifications.update({ id: n.id, sentAt: IsNull() }, { sentAt: new Date().toISOString(), lastError: null });
        if (marked !== 0) sent++;
      } catch (error) {
        await data.notifications.update({ id: n.id }, { lastError: (error as Error).message.slice(0, 500) });
      }
    }
    return sent;
  }

  return {
    async tick(now: Date): Promise<{ sent: number }> {
      const shop = await settings.get();
      const users = await data.users.find();
      settled.forUsers(users);
      const ctx = { data, now, timeZone: shop.timezone, shop: shopFormatOf(shop), publicUrl: options.publicUrl, dailyPlanHour: shop.dailyPlanHour, recoatWarningHours: options.recoatWarningHours, users, settled: settled.keys };
      for (const rule of notificationRules) {
        const due = await rule(ctx);
        await record(due);
        settled.add(due);
      }
      return { sent: await sendOwed() };
    },

    async recentFor(userId: number): Promise<Notification[]> {
      const rows = await data.notifications.find({ where: { userId }, order: { id: 'DESC' }, take: 50 });
      return rows.map(({ id, kind, subject, body, dueAt, sentAt }) => ({ id, kind, subject, body, dueAt, sentAt }));
    },
  };
}

/** Kinds decided per coat: once recorded for a coat, they are recorded for every user who wants them. */
const perCoat = /^(parts-ready|recoat-closing):(\d+):\d+$/;
// A coat leaves both rules' windows within a day or two; this many is far more than that, and then the set starts again.
const maxSettled = 50_000;

/**
 * The tick's memory of coats already decided (in this process): their keys are recorded, so
 * deciding them again on the next tick, once a minute for a day, would change nothing. It holds
 * only while the users (their roles, sites, choices) are the same: then the same keys would be made.
 */
class SettledCoats {
  readonly keys = new Set<string>();
  private usersSeen = '';

  forUsers(users: UserEntity[]): void {
    const seen = JSON.stringify(users.map((u) => [u.id, u.role, u.siteId, u.disabled, u.notify]));
    if (seen !== this.usersSeen || this.keys.size > maxSettled) this.keys.clear();
    this.usersSeen = seen;
  }

  add(due: DueNotification[]): void {
    for (const d of due) {
      const match = perCoat.exec(d.dedupeKey);
      if (match) this.keys.add(`${match[1]}:${match[2]}`);
    }
  }
}

export type NotificationService = ReturnType<typeof createNotificationService>;
