import { TZDate } from '@date-fns/tz';
import { In, type DataSource } from 'typeorm';
import { can, type Role } from '../../shared/permissions';
import type { LeadBoard, SprayerBoard, TodayBoard } from '../../shared/schemas/today';
import { calendarDateIn } from '../../shared/time';
import { BoothEntity } from '../db/entities/booth.entity';
import { JobEntity } from '../db/entities/job.entity';
import { systemClock, type Clock } from '../lib/clock';
import { everySite, type SiteScope } from '../lib/site-scope';
import type { PlannerService } from './planner';
import type { SettingsService } from './settings';
import { createSprayerService } from './sprayers';
import { jobsAtRisk, jobsInWork, partsBetweenCoats, staleSensors } from './today-lead';
import { sessionsIn, toTodaySessions } from './today-sessions';

export interface TodayViewer {
  id: number;
  role: Role;
}

/** Jobs still being finished; finished and cancelled ones are off the board. */
const workingStates = ['open', 'in-finish'];

/** Midnight at the start of a shop date, `days` later. */
function shopMidnight(date: string, timeZone: string, days = 0): Date {
  const [y, m, d] = date.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d + days, timeZone).getTime());
}

/** The day's working board, per role: the lead plans and unblocks, the sprayer sees what to do next. */
export function createTodayService(dataSource: DataSource, settings: SettingsService, planner: PlannerService, clock: Clock = systemClock) {
  const sprayers = createSprayerService(dataSource);

  async function shopDay() {
    const shop = await settings.get();
    const now = clock.now();
    const today = calendarDateIn(now, shop.timezone);
    const context = { planningTempC: shop.planningDryingTempC, now, timeZone: shop.timezone };
    return { now, today, timeZone: shop.timezone, context, startOf: (days: number) => shopMidnight(today, shop.timezone, days) };
  }

  async function leadBoard(scope: SiteScope): Promise<LeadBoard> {
    const day = await shopDay();
    const manager = dataSource.manager;
    const [entities, booths, jobs] = await Promise.all([
      sessionsIn(manager, { from: day.startOf(0), to: day.startOf(2), siteId: scope.siteId }),
      manager.find(BoothEntity, { where: scope.siteId === null ? {} : { siteId: scope.siteId }, order: { id: 'ASC' } }),
      manager.find(JobEntity, { where: { state: In(workingStates) }, order: { dueDate: 'ASC', id: 'ASC' } }).then((found) => jobsInWork(manager, found)),
    ]);
    const [sessions, people, between, risks, sensors] = await Promise.all([
      toTodaySessions(manager, entities, day.context),
      sprayers.list({}, scope),
      partsBetweenCoats(manager, jobs, day.now, day.startOf(1)),
      jobsAtRisk(planner, jobs, { today: day.today, timeZone: day.timeZone, scope }),
      staleSensors(manager, scope.siteId, day.now),
    ]);
    return {
      view: 'lead',
      generatedAt: day.now.toISOString(),
      today: day.today,
      tomorrow: calendarDateIn(day.startOf(1), day.timeZone),
      booths: booths.map((b) => ({ id: b.id, name: b.name, siteId: b.siteId })),
      sessions,
      sprayers: people,
      ...between,
      jobsAtRisk: risks,
      staleSensors: sensors,
    };
  }

  async function sprayerBoard(viewer: TodayViewer, scope: SiteScope): Promise<SprayerBoard> {
    const day = await shopDay();
    const manager = dataSource.manager;
    const later = { from: day.startOf(1), to: day.startOf(60), siteId: scope.siteId, sprayerId: viewer.id };
    const [mine, upcoming, unassigned] = await Promise.all([
      sessionsIn(manager, { from: day.startOf(0), to: day.startOf(1), siteId: scope.siteId, sprayerId: viewer.id }),
      sessionsIn(manager, later).then((found) => found.filter((s) => s.state === 'planned').slice(0, 1)),
      sessionsIn(manager, { from: day.now, to: day.startOf(1), siteId: scope.siteId, sprayerId: null }),
    ]);
    const [mySessions, next] = await Promise.all([toTodaySessions(manager, mine, day.context), toTodaySessions(manager, upcoming, day.context)]);
    return { view: 'sprayer', generatedAt: day.now.toISOString(), today: day.today, mySessions, nextSession: next[0] ?? null, unassignedToday: unassigned.length };
  }

  return {
    /** Leads and admins get the planning board; anyone else who runs sessions gets their own day. */
    board(viewer: TodayViewer, scope: SiteScope = everySite): Promise<TodayBoard> {
      return can(viewer.role, 'spray-sessions:write') ? leadBoard(scope) : sprayerBoard(viewer, scope);
    },
  };
}

export type TodayService = ReturnType<typeof createTodayService>;
