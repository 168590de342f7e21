import path from 'node:path';
import { TZDate } from '@date-fns/tz';
import { afterEach, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openingHoursProblem } from '../../../shared/finishing/opening-hours';
import { openDataSource } from '../../../server/db/data-source';
import { seedDemoWeek } from '../../../server/db/demo-week';
import { finishedPartsRack } from '../../../server/db/demo-week-racks';
import { BoothEntity } from '../../../server/db/entities/booth.entity';
import { CoatEntity } from '../../../server/db/entities/coat.entity';
import { FinishStepEntity } from '../../../server/db/entities/finish-step.entity';
import { JobEntity } from '../../../server/db/entities/job.entity';
import { PartEntity } from '../../../server/db/entities/part.entity';
import { RackEntity } from '../../../server/db/entities/rack.entity';
import { SpraySessionItemEntity } from '../../../server/db/entities/spray-session-item.entity';
import { SpraySessionEntity } from '../../../server/db/entities/spray-session.entity';
import { seedDemoShop } from '../../../server/db/seed';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

const zone = 'Europe/London';
let database: TestDatabase | undefined;
let dataSource: DataSource | undefined;

async function seededWeek(now: Date) {
  database = await createTestDatabase();
  dataSource = await openDataSource(database.config, { migrate: true });
  // Upkeep and crew records dated back from the same moment, so none has lapsed by then.
  await seedDemoShop(dataSource, { uploadDir: path.join(database.uploadDir), now });
  await seedDemoWeek(dataSource, { now });
  const sessions = await dataSource.getRepository(SpraySessionEntity).find({ order: { startAt: 'ASC', id: 'ASC' } });
  const booths = await dataSource.getRepository(BoothEntity).find();
  const items = await dataSource.getRepository(SpraySessionItemEntity).find();
  const coats = await dataSource.getRepository(CoatEntity).find();
  return { sessions, booths, items, coats };
}

afterEach(async () => {
  await dataSource?.destroy();
  await database?.drop();
  dataSource = undefined;
  database = undefined;
});

const wall = (iso: string) => new Intl.DateTimeFormat('en-GB', { timeZone: zone, weekday: 'short', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));
const overlaps = (a: SpraySessionEntity, b: SpraySessionEntity) => a.startAt < b.endAt && b.startAt < a.endAt;

/** The rules the booking API enforces: booth open, one session per booth and per sprayer at a time. */
function expectBookable(week: Awaited<ReturnType<typeof seededWeek>>) {
  for (const session of week.sessions) {
    const booth = week.booths.find((b) => b.id === session.boothId)!;
    expect(openingHoursProblem(new Date(session.startAt), new Date(session.endAt), booth.openingHours, zone), wall(session.startAt)).toBeNull();
    expect(session.sprayerId).not.toBeNull();
    expect(week.items.filter((i) => i.spraySessionId === session.id).length).toBeGreaterThan(0);
    for (const other of week.sessions.filter((o) => o.id < session.id && overlaps(o, session))) {
      expect(other.boothId, `${wall(session.startAt)} and ${wall(other.startAt)} share a booth`).not.toBe(session.boothId);
      expect(other.sprayerId, `${wall(session.startAt)} and ${wall(other.startAt)} share a sprayer`).not.toBe(session.sprayerId);
    }
  }
}

/** The Tuesday after `from`, at a time on the shop's clock. */
function nextTuesdayAt(from: Date, hour: number, minute: number): Date {
  const day = new TZDate(from.getTime(), zone);
  const ahead = ((2 - day.getDay() + 7) % 7) || 7;
  return new TZDate(day.getFullYear(), day.getMonth(), day.getDate() + ahead, hour, minute, zone);
}

describe('the demo week', () => {
  it('books today and the next working days; on a Tuesday at 11:00 Monday is sprayed, the first session today is done, the next under way, the rest planned', async () => {
    const now = nextTuesdayAt(new Date(), 11, 0);
    const week = await seededWeek(now);
    expectBookable(week);
    const days = [...new Set(week.sessions.map((s) => wall(s.startAt).slice(0, 7)))];
    // Monday gone by, then Tuesday to Friday and the next Monday: the weekend is skipped.
    expect(days.map((d) => d.slice(0, 3))).toEqual(['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Mon']);
    const onDay = (day: string) => week.sessions.filter((s) => wall(s.startAt).startsWith(day));
    const today = onDay(wall(now.toISOString()).slice(0, 7));
    expect(today.map((s) => [wall(s.startAt).slice(-5), s.state])).toEqual([['08:00', 'done'], ['10:00', 'spraying'], ['13:00', 'planned']]);
    const monday = onDay(days[0]);
    expect(monday.map((s) => [wall(s.startAt).slice(-5), s.state])).toEqual([['08:00', 'done'], ['10:00', 'done'], ['13:00', 'done']]);
    // Each session sprayed so far holds its coat and the checks made before spraying.
    for (const session of [...monday, ...today.slice(0, 2)]) {
      expect(session.checklist?.verdict).not.toBe('stop');
      expect(week.coats.filter((c) => c.spraySessionId === session.id)).toHaveLength(1);
    }
    expect(week.sessions.filter((s) => s.state === 'planned')).toHaveLength(week.sessions.length - 5);
    expect(week.coats).toHaveLength(5);
  }, 60_000);

  it('on a Saturday has the week gone by sprayed on its own jobs and the next week booked', async () => {
    const now = new Date('2027-03-27T12:00:00Z');
    const week = await seededWeek(now);
    expectBookable(week);
    const past = week.sessions.filter((s) => s.startAt < now.toISOString());
    const ahead = week.sessions.filter((s) => s.startAt > now.toISOString());
    expect([...new Set(past.map((s) => wall(s.startAt).slice(0, 3)))]).toEqual(['Mon', 'Tue', 'Wed', 'Thu', 'Fri']);
    expect(past.every((s) => s.state === 'done')).toBe(true);
    expect(week.coats).toHaveLength(past.length);
    // Three lines a day, Monday to Friday, on either side of the weekend; the oak line's two jobs
    // ahead are two coats each, so it has Friday free.
    expect(past).toHaveLength(15);
    expect(ahead).toHaveLength(14);
    const partsOf = (sessions: SpraySessionEntity[]) => new Set(week.items.filter((i) => sessions.some((s) => s.id === i.spraySessionId)).map((i) => i.partId));
    const sprayed = partsOf(past);
    expect([...partsOf(ahead)].some((id) => sprayed.has(id))).toBe(false);
  }, 60_000);

  it('puts a job’s parts on the drying rack once its last coat is on, no shelf holding more than its area', async () => {
    const now = new Date('2027-03-27T12:00:00Z');
    await seededWeek(now);
    const rack = await dataSource!.getRepository(RackEntity).findOneByOrFail({ name: finishedPartsRack });
    const parts = await dataSource!.getRepository(PartEntity).find();
    const jobs = await dataSource!.getRepository(JobEntity).find();
    const coatSteps = await dataSource!.getRepository(FinishStepEntity).findBy({ kind: 'coat' });
    // Which step each part has had, from the coat records themselves.
    const rows: { partId: number; stepPosition: number }[] = await dataSource!.query('SELECT cp.part_id AS "partId", c.step_position AS "stepPosition" FROM coat_parts cp JOIN coats c ON c.id = cp.coat_id');
    const finished = (part: PartEntity) => {
      const system = jobs.find((j) => j.id === part.jobId)!.finishSystemId;
      const last = Math.max(...coatSteps.filter((s) => s.finishSystemId === system).map((s) => s.position));
      return rows.some((r) => r.partId === part.id && r.stepPosition === last);
    };
    const weekParts = parts.filter((p) => rows.some((r) => r.partId === p.id));
    const done = weekParts.filter(finished);
    expect(done.length).toBeGreaterThan(10);
    expect(done.every((p) => p.rackId === rack.id && p.shelf !== null && p.shelf <= rack.shelves)).toBe(true);
    // Parts between coats stay off the rack (on a Saturday, the jobs still in finish have some).
    const between = weekParts.filter((p) => !finished(p));
    expect(between.length).toBeGreaterThan(0);
    expect(between.every((p) => p.rackId === null)).toBe(true);
    // Laid flat, a shelf holds what its area holds.
    const loads = new Map<number, number>();
    for (const p of done) loads.set(p.shelf!, (loads.get(p.shelf!) ?? 0) + (p.lengthMm * p.widthMm * p.quantity) / 1e6);
    expect(Math.max(...loads.values())).toBeLessThanOrEqual(rack.shelfAreaM2);
    expect(loads.size).toBeGreaterThan(1);
  }, 60_000);

  it('books at 08:00 on the shop’s clock across the change to summer time', async () => {
    // Saturday 27 March 2027; the clocks go forward early on Sunday 28 March.
    const now = new Date('2027-03-27T12:00:00Z');
    const week = await seededWeek(now);
    expectBookable(week);
    const ahead = week.sessions.filter((s) => s.startAt > now.toISOString());
    expect(ahead.every((s) => s.state === 'planned')).toBe(true);
    const booth1 = week.booths.find((b) => b.name === 'Booth 1 (cross-draft)')!;
    const mornings = ahead.filter((s) => s.boothId === booth1.id && wall(s.startAt).endsWith('08:00')).map((s) => s.startAt);
    expect(mornings).toEqual(['2027-03-29T07:00:00.000Z', '2027-03-30T07:00:00.000Z', '2027-03-31T07:00:00.000Z', '2027-04-01T07:00:00.000Z', '2027-04-02T07:00:00.000Z']);
  }, 60_000);

  it('plans each job’s coats in the order of its finish system, the whole of a short job within the week', async () => {
    const week = await seededWeek(new Date('2027-03-27T12:00:00Z'));
    const stepsByPart = new Map<number, number[]>();
    for (const session of week.sessions) {
      for (const item of week.items.filter((i) => i.spraySessionId === session.id)) stepsByPart.set(item.partId, [...(stepsByPart.get(item.partId) ?? []), item.stepPosition!]);
    }
    for (const steps of stepsByPart.values()) expect(steps).toEqual([...steps].sort((a, b) => a - b));
    expect([...stepsByPart.values()].some((steps) => steps.length === 3)).toBe(true);
  }, 60_000);
});
