import { In } from 'typeorm';
import { recordStatus } from '../../shared/finishing/fitness';
import { dueStatus } from '../../shared/finishing/upkeep-due';
import { can } from '../../shared/permissions';
import type { SignedInUser } from '../../shared/schemas/auth';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { FilterBank, UpkeepDue, UpkeepDueItem } from '../../shared/schemas/upkeep';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { CrewRecordEntity } from '../db/entities/crew-record.entity';
import type { UserEntity } from '../db/entities/user.entity';
import { systemClock, type Clock } from '../lib/clock';
import type { SettingsService } from './settings';
import { banksOfBooths, crewRecordsOf, latestTestsOfBooths, shopDay, type LatestTests } from './upkeep-facts';

/** A due item with the key that names the record and its state, for the e-mail dedupe keys. */
export type KeyedItem = UpkeepDueItem & { key: string; dueOn: string | null };
export interface Window {
  today: string;
  /** Due within this many days counts as due soon. */
  withinDays: number;
}

/** What makes a booth or a person not fit to spray now, as against soon. */
const stopping = (item: UpkeepDueItem) => ['lapsed', 'over-limit', 'failed'].includes(item.status) || (item.status === 'none' && item.kind !== 'training');
export const fitNow = (items: UpkeepDueItem[]) => !items.some(stopping);

function dated(kind: KeyedItem['kind'], what: string, record: { id: number; nextDueOn: string | null } | null, w: Window): KeyedItem[] {
  if (!record) return [{ kind, status: 'none', message: `No ${what} is recorded.`, key: `${kind}:none`, dueOn: null }];
  const status = dueStatus(record.nextDueOn, w.today, w.withinDays);
  if (status === 'lapsed') return [{ kind, status, message: `The ${what} has lapsed.`, key: `${kind}:${record.id}:lapsed`, dueOn: record.nextDueOn }];
  if (status === 'due-soon') return [{ kind, status, message: `The ${what} is due soon.`, key: `${kind}:${record.id}:due-soon`, dueOn: record.nextDueOn }];
  return [];
}

/** A booth's filters near or past their limit, and its extraction test and fire inspection due, lapsed or missing. */
function boothDueItems(banks: FilterBank[], { extraction, fire }: LatestTests, w: Window): KeyedItem[] {
  const items: KeyedItem[] = [];
  for (const bank of banks) {
    if (bank.status !== 'over-limit' && bank.status !== 'near-limit') continue;
    const message = `Filter bank “${bank.name}” reads ${Math.round(bank.currentPa ?? 0)} Pa of its ${bank.changeAtPa} Pa limit${bank.status === 'over-limit' ? ': change it' : ''}.`;
    items.push({ kind: 'filter', status: bank.status, message, key: `filter:${bank.id}:${bank.lastChange?.id ?? 0}:${bank.status}`, dueOn: null });
  }
  items.push(...dated('extraction-test', 'extraction test', extraction, w));
  if (fire && !fire.passed) items.push({ kind: 'fire-inspection', status: 'failed', message: 'The last fire-protection inspection found faults.', key: `fire-inspection:${fire.id}:failed`, dueOn: null });
  else items.push(...dated('fire-inspection', 'fire-protection inspection', fire, w));
  return items;
}

/** What is due on each booth, read in a fixed handful of queries however many booths there are. */
export async function boothsDueItems(data: SiteData, booths: BoothEntity[], w: Window): Promise<Map<number, KeyedItem[]>> {
  const ids = booths.map((b) => b.id);
  const [banks, tests] = await Promise.all([banksOfBooths(data, ids), latestTestsOfBooths(data, ids)]);
  return new Map(ids.map((id) => [id, boothDueItems(banks.get(id) ?? [], tests.get(id)!, w)]));
}

/** A person's fit test, health surveillance and training that are due, lapsed (or failed) or missing. Never a date in the message. */
export function crewDueItems(latest: { fitTest: CrewRecordEntity | null; surveillance: CrewRecordEntity | null; trainings: CrewRecordEntity[] }, w: Window): KeyedItem[] {
  const items: KeyedItem[] = [];
  const fit = latest.fitTest;
  if (fit && fit.result === 'fail') items.push({ kind: 'fit-test', status: 'failed', message: 'The latest face-fit test was not a pass.', key: `fit-test:${fit.id}:failed`, dueOn: null });
  else items.push(...dated('fit-test', 'face-fit test', fit, w));
  items.push(...dated('health-surveillance', 'health surveillance for isocyanate work', latest.surveillance, w));
  for (const t of latest.trainings) {
    const status = recordStatus({ nextDueOn: t.nextDueOn, passed: true }, w.today, w.withinDays);
    if (status === 'lapsed' || status === 'due-soon') items.push({ kind: 'training', status, message: `Training “${t.title}” ${status === 'lapsed' ? 'has lapsed' : 'is due soon'}.`, key: `training:${t.id}:${status}`, dueOn: t.nextDueOn });
  }
  return items;
}

/** The people whose records matter: sprayers and leads, active. */
export const crewOfScope = (data: SiteData) => data.users.find({ where: { role: In(['sprayer', 'lead']), disabled: false }, order: { name: 'ASC', id: 'ASC' } });

const plain = ({ kind, status, message }: KeyedItem): UpkeepDueItem => ({ kind, status, message });

/** For the lead's Today board: booths and people of the caller's sites that are not fit to spray, or will not be soon. */
export function createUpkeepDueService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  return {
    async due(viewer: Pick<SignedInUser, 'id' | 'role'>, withinDays?: number): Promise<UpkeepDue> {
      const shop: ShopSettings = await settings.get();
      const w: Window = { today: shopDay(clock.now(), shop), withinDays: withinDays ?? shop.upkeepDueSoonDays };
      const booths = await data.booths.find({ order: { name: 'ASC', id: 'ASC' } });
      const due = await boothsDueItems(data, booths, w);
      const boothRows = booths
        .map((booth) => ({ booth, items: due.get(booth.id)! }))
        .filter((row) => row.items.length)
        .map(({ booth, items }) => ({ boothId: booth.id, boothName: booth.name, siteId: booth.siteId, fit: fitNow(items), items: items.map(plain) }));
      const wholeCrew = can(viewer.role, 'crew:status');
      const people: UserEntity[] = wholeCrew ? await crewOfScope(data) : await data.users.findBy({ id: viewer.id });
      const latest = await crewRecordsOf(data, people.map((p) => p.id));
      const crew = people
        .map((p) => ({ person: p, items: crewDueItems(latest.get(p.id)!, w) }))
        .filter((row) => row.items.length)
        .map(({ person, items }) => ({ userId: person.id, name: person.name, siteId: person.siteId, fit: fitNow(items), items: items.map(plain) }));
      return { asOf: w.today, booths: boothRows, crew, wholeCrew };
    },
  };
}

export type UpkeepDueService = ReturnType<typeof createUpkeepDueService>;
