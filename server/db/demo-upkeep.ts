import type { DataSource } from 'typeorm';
import type { CreateCrewRecordInput } from '../../shared/schemas/crew';
import { calendarDateIn } from '../../shared/time';
import { openSiteData } from '../data/site-data';
import type { Clock } from '../lib/clock';
import { everySite } from '../lib/site-scope';
import { createCrewService } from '../services/crew';
import { createSettingsService } from '../services/settings';
import { createUpkeepService } from '../services/upkeep';
import { BoothEntity } from './entities/booth.entity';
import { UserEntity } from './entities/user.entity';

const dayMs = 86_400_000;

/**
 * The demo shop's booth upkeep and crew records, dated back from `now`: booth 1's arrestor pads
 * near their limit, the spray room's extraction test and Mina's fit test due within the month,
 * everything else in order. Every firm and model named is invented.
 */
export async function seedDemoUpkeep(dataSource: DataSource, now: Date): Promise<void> {
  const data = openSiteData(dataSource, everySite);
  const clock: Clock = { now: () => now };
  const settings = createSettingsService(data, clock);
  const upkeep = createUpkeepService(data, settings, clock);
  const crew = createCrewService(data, settings, clock);
  const { timezone } = await settings.get();
  const daysAgo = (days: number) => calendarDateIn(new Date(now.getTime() - days * dayMs), timezone);
  const at = (days: number, hour = 8) => new Date(now.getTime() - days * dayMs - (now.getUTCHours() - hour) * 3_600_000).toISOString();
  const users = await dataSource.getRepository(UserEntity).find();
  const person = (email: string) => users.find((u) => u.email === email)!;
  const lead = { id: person('lead@larchmere.test').id, name: person('lead@larchmere.test').name };
  const sprayer = { id: person('sprayer@larchmere.test').id, name: person('sprayer@larchmere.test').name };
  const owner = { id: person('owner@larchmere.test').id, name: person('owner@larchmere.test').name };
  const [booth1, sprayRoom] = await dataSource.getRepository(BoothEntity).find({ order: { id: 'ASC' } });

  const arrestor = await upkeep.createBank({ boothId: booth1.id, name: 'Arrestor pads, back wall', kind: 'paint-arrestor', changeAtPa: 250 }, lead);
  const intake = await upkeep.createBank({ boothId: booth1.id, name: 'Ceiling intake', kind: 'ceiling-intake', changeAtPa: 200 }, lead);
  const wall = await upkeep.createBank({ boothId: sprayRoom.id, name: 'Wall arrestor pads', kind: 'paint-arrestor', changeAtPa: 200 }, lead);
  await upkeep.recordFilterChange({ filterBankId: arrestor.id, changedAt: at(24, 7), beforePa: 258, afterPa: 55, notes: 'Pads heavily loaded on the left; replaced all twelve.' }, sprayer);
  for (const [days, pa] of [[17, 110], [10, 160], [3, 196], [1, 214]] as const) await upkeep.recordGaugeReading({ filterBankId: arrestor.id, pressureDropPa: pa, at: at(days) }, { actor: sprayer });
  for (const [days, pa] of [[10, 82], [1, 88]] as const) await upkeep.recordGaugeReading({ filterBankId: intake.id, pressureDropPa: pa, at: at(days) }, { actor: sprayer });
  await upkeep.recordFilterChange({ filterBankId: wall.id, changedAt: at(40, 7), beforePa: 204, afterPa: 48 }, lead);
  await upkeep.recordGaugeReading({ filterBankId: wall.id, pressureDropPa: 104, at: at(2) }, { actor: lead });

  const tester = 'Fellgate Airflow Testing';
  await upkeep.recordExtractionTest({ boothId: booth1.id, testedOn: daysAgo(150), faceVelocityPointsMps: [0.52, 0.49, 0.55, 0.47, 0.51, 0.53, 0.5, 0.48, 0.54], clearanceMin: 3.5, testedBy: tester, notes: 'Smoke test: booth clear in 3 min 30 s.' }, lead);
  // Tested 13 months and a week ago: with the 14-month interval it falls due within the month.
  await upkeep.recordExtractionTest({ boothId: sprayRoom.id, testedOn: daysAgo(403), faceVelocityPointsMps: [0.42, 0.45, 0.4, 0.44, 0.41, 0.43], clearanceMin: 24, testedBy: tester }, lead);
  for (const booth of [booth1, sprayRoom]) {
    await upkeep.recordFireInspection({ boothId: booth.id, inspectedOn: daysAgo(120), inspectedBy: 'Keldmoor Fire Services', passed: true, notes: 'Extinguishers serviced; interlock tested.' }, lead);
  }

  const records: [number, CreateCrewRecordInput][] = [
    // Mina's fit test falls due in about a fortnight.
    [sprayer.id, { kind: 'fit-test', doneOn: daysAgo(351), respiratorModel: 'Ostrel HM-200 half mask, A2P3, size M', result: 'pass' }],
    [sprayer.id, { kind: 'health-surveillance', doneOn: daysAgo(130), notes: 'Questionnaire and spirometry.' }],
    [sprayer.id, { kind: 'training', doneOn: daysAgo(240), title: 'Diisocyanates: safe use', nextDueOn: daysAgo(240 - 5 * 365) }],
    [lead.id, { kind: 'fit-test', doneOn: daysAgo(90), respiratorModel: 'Ostrel HM-200 half mask, A2P3, size L', result: 'pass' }],
    [lead.id, { kind: 'health-surveillance', doneOn: daysAgo(200) }],
  ];
  for (const [userId, record] of records) await crew.record(userId, record, owner);
}
