import { can, seesAllSites } from '../../shared/permissions';
import { notifyPrefsOf, type NotificationKind } from '../../shared/schemas/notification';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { UserEntity } from '../db/entities/user.entity';
import type { DueNotification, RuleContext } from './notification-rules';
import { calendarDateWords } from '../../shared/words';
import { boothsDueItems, crewDueItems, crewOfScope, type KeyedItem, type Window } from './upkeep-due';
import { crewRecordsOf, shopDay } from './upkeep-facts';

/** Only what has changed for the worse is worth an e-mail: due soon, lapsed, failed, near or past a filter limit; never "none recorded". */
const mailable = (item: KeyedItem) => item.status !== 'none';
const wants = (user: UserEntity, kind: NotificationKind) => !user.disabled && notifyPrefsOf(user.role, user.notify)[kind];
const ofSite = (user: UserEntity, siteId: number) => seesAllSites(user.role) || user.siteId === siteId;
const lines = (items: KeyedItem[]) => items.map((i) => `- ${i.message}`).join('\n');
const closing = 'Follow your local regulations and the booth and equipment makers’ instructions.';

async function windowOf(ctx: RuleContext): Promise<Window> {
  const shop: Pick<ShopSettings, 'timezone' | 'upkeepDueSoonDays'> = { timezone: ctx.timeZone, upkeepDueSoonDays: (await ctx.data.settings.findOneBy({ id: 1 }))?.upkeepDueSoonDays ?? 30 };
  return { today: shopDay(ctx.now, shop), withinDays: shop.upkeepDueSoonDays };
}

/** Booth upkeep falling due, to the people of the booth's site who asked: once per record and state (dedupe key). */
export async function upkeepDue(ctx: RuleContext): Promise<DueNotification[]> {
  const w = await windowOf(ctx);
  const due: DueNotification[] = [];
  const booths = await ctx.data.booths.find({ order: { id: 'ASC' } });
  const dueByBooth = await boothsDueItems(ctx.data, booths, w);
  for (const booth of booths) {
    const items = dueByBooth.get(booth.id)!.filter(mailable);
    for (const item of items) {
      const subject = `Booth upkeep: ${booth.name}, ${item.kind.replaceAll('-', ' ')} ${item.status.replaceAll('-', ' ')}`;
      const body = `${booth.name}:\n${lines([item])}${item.dueOn ? `\nDue on ${calendarDateWords(item.dueOn, ctx.shop.locale)}.` : ''}\n\n${closing}\n\nBooth upkeep: ${ctx.publicUrl}/upkeep`;
      for (const user of ctx.users.filter((u) => wants(u, 'upkeep-due') && ofSite(u, booth.siteId) && can(u.role, 'upkeep:read'))) {
        due.push({ dedupeKey: `upkeep-due:${booth.id}:${item.key}:${user.id}`, kind: 'upkeep-due', userId: user.id, subject, body, dueAt: ctx.now.toISOString() });
      }
    }
  }
  return due;
}

/**
 * A person's own fit test, health surveillance or training falling due goes to them with its date;
 * the admin and the leads of their site who asked hear of it as a status only, with no dates.
 */
export async function crewDue(ctx: RuleContext): Promise<DueNotification[]> {
  const w = await windowOf(ctx);
  const people = await crewOfScope(ctx.data);
  const latest = await crewRecordsOf(ctx.data, people.map((p) => p.id));
  const due: DueNotification[] = [];
  for (const person of people) {
    const items = crewDueItems(latest.get(person.id)!, w).filter(mailable);
    for (const item of items) {
      const dated = item.dueOn ? ` It is due on ${calendarDateWords(item.dueOn, ctx.shop.locale)}.` : '';
      if (wants(person, 'crew-due')) {
        due.push({ dedupeKey: `crew-due:${item.key}:${person.id}`, kind: 'crew-due', userId: person.id, subject: `Your records: ${item.message}`, body: `${item.message.replace('The ', 'Your ')}${dated}\nAsk the owner to book it.\n\nYour records: ${ctx.publicUrl}/crew/${person.id}`, dueAt: ctx.now.toISOString() });
      }
      for (const reader of ctx.users.filter((u) => u.id !== person.id && wants(u, 'crew-due') && can(u.role, 'crew:status') && ofSite(u, person.siteId))) {
        due.push({ dedupeKey: `crew-due:${item.key}:${reader.id}`, kind: 'crew-due', userId: reader.id, subject: `Crew records: ${person.name}`, body: `${person.name}: ${item.message.replace('The ', 'their ')}\n\nCrew records: ${ctx.publicUrl}/crew`, dueAt: ctx.now.toISOString() });
      }
    }
  }
  return due;
}
