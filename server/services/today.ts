import { TZDate } from '@date-fns/tz';
import { In } from 'typeorm';
import { can, type Role } from '../../shared/permissions';
import type { LeadBoard, SprayerBoard, TodayBoard } from '../../shared/schemas/today';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import { systemClock, type Clock } from '../lib/clock';
import type { PlannerService } from './planner';
import type { SettingsService } from './settings';
import type { SprayerService } from './sprayers';
import { jobsAtRisk, jobsInWork, partsBetweenCoats, staleSensors } from './today-lead';
import { sessionsIn, toTodaySessions } from './today-sessions';
import type { UpkeepDueService } from './upkeep-due';

export interface TodayViewer {
  id: number;
  role: Role;
}

/** Jobs still being finished; ready (waiting to be collected), delivered and cancelled ones are off the board. */
const workingStates = ['open', 'in-finish'];

/** Midnight at the start of a shop date, `days` later. */
function shopMidnight(date: string, timeZone: string, days = 0): Date {
  const [y, m, d] = date.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d + days, timeZone).getTime());
}

/** What the board is made from besides the data: the shop settings, the planner and the sprayer list, all on the same scope. */
export interface TodayDeps {
  settings: SettingsService;
  planner: PlannerService;
  sprayers: SprayerService;
  upkeepDue: UpkeepDueService;
}

/**
 * The day's working board, per role: the lead plans and unblocks, the sprayer sees what to do
 * next. Everything on it is the scope's site's: its booths and sessions, its parts, its people.
 */
export function createTodayService(data: SiteData, { settings, planner, sprayers, upkeepDue }: TodayDeps, clock: Clock = systemClock) {
  async function shopDay() {
    const shop = await settings.get();
    const now = clock.now();
    const today = calendarDateIn(now, shop.timezone);
    const context = { planningTempC: shop.planningDryingTempC, now, timeZone: shop.timezone };
    return { now, today, timeZone: shop.timezone, context, startOf: (days: number) => shopMidnight(today, shop.timezone, days) };
  }

  async function leadBoard(viewer: TodayViewer): Promise<LeadBoard> {
    const day = await shopDay();
    const [entities, booths, work] = await Promise.all([
      sessionsIn(data, { from: day.startOf(0), to: day.startOf(2) }),
      data.booths.find({ order: { id: 'ASC' } }),
      data.jobs.find({ where: { state: In(workingStates) }, order: { dueDate: 'ASC', id: 'ASC' } }).then((found) => jobsInWork(data, found)),
    ]);
    const [sessions, people, between, risks, sensors, upkeep] = await Promise.all([
      toTodaySessions(data, entities, day.context),
      sprayers.list(),
      partsBetweenCoats(data, work, day.now, day.startOf(1)),
      jobsAtRisk(planner, work.jobs, { today: day.today, timeZone: day.timeZone }),
      staleSensors(data, day.now),
      upkeepDue.due(viewer),
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
      upkeepDue: upkeep,
    };
  }

  async function sprayerBoard(viewer: TodayViewer): Promise<SprayerBoard> {
    const day = await shopDay();
    const later = { from: day.startOf(1), to: day.startOf(60), sprayerId: viewer.id };
    const [mine, upcoming, unassigned] = await Promise.all([
      sessionsIn(data, { from: day.startOf(0), to: day.startOf(1), sprayerId: viewer.id }),
      sessionsIn(data, later).then((found) => found.filter((s) => s.state === 'planned').slice(0, 1)),
      sessionsIn(data, { from: day.now, to: day.startOf(1), sprayerId: null }),
    ]);
    const [mySessions, next] = await Promise.all([toTodaySessions(data, mine, day.context), toTodaySessions(data, upcoming, day.context)]);
    return { view: 'sprayer', generatedAt: day.now.toISOString(), today: day.today, mySessions, nextSession: next[0] ?? null, unassignedToday: unassigned.length };
  }

  return {
    /** Leads and admins get the planning board; anyone else who runs sessions gets their own day. */
    board(viewer: TodayViewer): Promise<TodayBoard> {
      return can(viewer.role, 'spray-sessions:write') ? leadBoard(viewer) : sprayerBoard(viewer);
    },
  };
}

export type TodayService = ReturnType<typeof createTodayService>;
