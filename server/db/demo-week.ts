import { TZDate } from '@date-fns/tz';
import { addDays } from 'date-fns';
import { In, type DataSource } from 'typeorm';
import { openingHoursProblem } from '../../shared/finishing/opening-hours';
import { calendarDateIn } from '../../shared/time';
import { openSiteData } from '../data/site-data';
import { everySite } from '../lib/site-scope';
import { systemActor } from '../services/audit';
import { createCoatService } from '../services/coats';
import { EventBus } from '../services/events';
import { createJobService } from '../services/jobs';
import { createMixService } from '../services/mixes';
import { createPartService } from '../services/parts';
import { createSettingsService } from '../services/settings';
import { createSpraySessionService } from '../services/spray-sessions';
import { BoothEntity } from './entities/booth.entity';
import { FinishStepEntity } from './entities/finish-step.entity';
import { FinishSystemEntity } from './entities/finish-system.entity';
import { PartEntity } from './entities/part.entity';
import { ProductEntity } from './entities/product.entity';
import { RackEntity } from './entities/rack.entity';
import { UserEntity } from './entities/user.entity';
import { runSessionSoFar, type RunContext, type WeekSession } from './demo-week-run';
import { createRackShelver, finishedPartsRack } from './demo-week-racks';
import { weekLanes, type WeekJob } from './demo-week-jobs';

const dayMs = 86_400_000;

/** A job of the week with its coat steps still to book, in order. */
interface QueuedJob {
  partIds: number[];
  steps: { position: number; productId: number; dryFilmUm: number }[];
}

/** Today (if the booths open today) and the next working days, as shop-zone midnights. */
export function workingDays(now: Date, timeZone: string, openWeekdays: Set<number>, count: number): TZDate[] {
  const days: TZDate[] = [];
  const today = new TZDate(now.getTime(), timeZone);
  for (let offset = 0; days.length < count && offset < 14; offset++) {
    const day = addDays(new TZDate(today.getFullYear(), today.getMonth(), today.getDate(), timeZone), offset);
    if (openWeekdays.has(day.getDay())) days.push(day);
  }
  return days;
}

/** This week's working days before today (Monday first), as shop-zone midnights: none on a Monday. */
export function earlierWorkingDays(now: Date, timeZone: string, openWeekdays: Set<number>): TZDate[] {
  const today = new TZDate(now.getTime(), timeZone);
  const midnight = new TZDate(today.getFullYear(), today.getMonth(), today.getDate(), timeZone);
  const sinceMonday = (midnight.getDay() + 6) % 7;
  return Array.from({ length: sinceMonday }, (_, i) => addDays(midnight, i - sinceMonday)).filter((day) => openWeekdays.has(day.getDay()));
}

async function createWeekJobs(dataSource: DataSource, jobs: WeekJob[], now: Date, timeZone: string): Promise<QueuedJob[]> {
  const jobService = createJobService(openSiteData(dataSource, everySite));
  const partService = createPartService(openSiteData(dataSource, everySite));
  const systems = new Map((await dataSource.getRepository(FinishSystemEntity).find()).map((s) => [s.name, s.id]));
  const queued: QueuedJob[] = [];
  for (const { dueInDays, finishSystem, parts, ...fields } of jobs) {
    const finishSystemId = systems.get(finishSystem);
    if (!finishSystemId) continue;
    const job = await jobService.create({ ...fields, dueDate: calendarDateIn(new Date(now.getTime() + dueInDays * dayMs), timeZone), finishSystemId }, systemActor);
    const created = await partService.createMany(job.id, parts, systemActor);
    const coatSteps = await dataSource.getRepository(FinishStepEntity).find({ where: { finishSystemId, kind: 'coat' }, order: { position: 'ASC' } });
    queued.push({ partIds: created.map((p) => p.id), steps: coatSteps.map((s) => ({ position: s.position, productId: s.productId!, dryFilmUm: s.dryFilmUm! })) });
  }
  return queued;
}

/** Every coat of a line's jobs, in the order the line sprays them: one a working day. */
function coatsInOrder(jobs: QueuedJob[]): { partIds: number[]; step: QueuedJob['steps'][number]; lastCoat: boolean }[] {
  return jobs.flatMap((job) => job.steps.map((step, i) => ({ partIds: job.partIds, step, lastCoat: i === job.steps.length - 1 })));
}

/**
 * Booked spray sessions for this week's earlier working days, today (when the booths open today)
 * and the next working days, made through the services the API uses, so every booking meets the
 * same rules (booth open, no overlap, an active sprayer of the booth's site). A session whose time
 * has come is run as far as the clock allows: checks, a pot and its coats for one that is over,
 * checks and spraying for one under way. The earlier days work through jobs of their own, so the
 * days ahead are as full whatever the weekday. `now` is the moment the seed runs.
 */
export async function seedDemoWeek(dataSource: DataSource, options: { now?: Date; days?: number } = {}): Promise<{ sessions: number }> {
  const now = options.now ?? new Date();
  const clock = { at: now, now() { return this.at; } };
  const data = openSiteData(dataSource, everySite);
  const settings = createSettingsService(data, clock);
  const events = new EventBus();
  const { timezone } = await settings.get();
  const booths = await dataSource.getRepository(BoothEntity).find({ order: { id: 'ASC' } });
  const users = await dataSource.getRepository(UserEntity).find();
  const openWeekdays = new Set(booths.flatMap((b) => b.openingHours.map((span) => span.weekday % 7)));
  const earlierDays = earlierWorkingDays(now, timezone, openWeekdays);
  const days = workingDays(now, timezone, openWeekdays, options.days ?? 5);
  const run: RunContext = { clock, now, sessions: createSpraySessionService(data, settings, events, clock), mixes: createMixService(data, clock), coats: createCoatService(data, settings, events, clock),
    products: new Map((await dataSource.getRepository(ProductEntity).find()).map((p) => [p.id, p])),
    shelve: createRackShelver(await dataSource.getRepository(RackEntity).findOneBy({ name: finishedPartsRack }) ?? undefined, createPartService(data, clock, events), (ids) => dataSource.getRepository(PartEntity).find({ where: { id: In(ids) }, order: { id: 'ASC' } })),
  };
  let sessions = 0;
  for (const lane of weekLanes) {
    const booth = booths.find((b) => b.name === lane.booth);
    const sprayer = users.find((u) => u.email === lane.sprayerEmail && !u.disabled);
    if (!booth || !sprayer) continue;
    const lineSprayer = { id: sprayer.id, name: sprayer.name, mayOverride: sprayer.role !== 'sprayer' };
    const earlier = coatsInOrder(await createWeekJobs(dataSource, lane.earlier, now, timezone));
    const ahead = coatsInOrder(await createWeekJobs(dataSource, lane.jobs, now, timezone));
    for (const [queue, onDays] of [[earlier, earlierDays], [ahead, days]] as const) {
      for (const day of onDays) {
        const start = new TZDate(day.getFullYear(), day.getMonth(), day.getDate(), ...lane.from, timezone);
        const end = new TZDate(day.getFullYear(), day.getMonth(), day.getDate(), ...lane.to, timezone);
        if (openingHoursProblem(start, end, booth.openingHours, timezone)) continue;
        const coat = queue.shift();
        if (!coat) break;
        await bookAndRun(run, { booth, start, end, partIds: coat.partIds, step: coat.step, lastCoat: coat.lastCoat, sprayer: lineSprayer });
        sessions++;
      }
    }
  }
  return { sessions };
}

/** Books the session as the lead does (the clock at the seed's moment), then runs it as far as that moment allows. */
async function bookAndRun(run: RunContext, session: Omit<WeekSession, 'id'>): Promise<void> {
  run.clock.at = run.now;
  const { booth, start, end, sprayer, partIds, step } = session;
  const booked = await run.sessions.create({ boothId: booth.id, start: start.toISOString(), end: end.toISOString(), sprayerId: sprayer.id, items: partIds.map((partId) => ({ partId, stepPosition: step.position })) }, systemActor);
  await runSessionSoFar(run, { ...session, id: booked.id });
}
