import { In, LessThanOrEqual, MoreThan } from 'typeorm';
import { seesAllSites } from '../../shared/permissions';
import { notifyPrefsOf, type NotificationKind } from '../../shared/schemas/notification';
import { calendarDateIn, wallClockIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import type { UserEntity } from '../db/entities/user.entity';
import { readinessOf } from './ready';
import { crewDue, upkeepDue } from './upkeep-notifications';

export interface DueNotification {
  dedupeKey: string;
  kind: NotificationKind;
  userId: number;
  subject: string;
  body: string;
  dueAt: string;
}

export interface RuleContext {
  /** Every site: the scheduler decides for the whole group, and each e-mail goes to the site it is about. */
  data: SiteData;
  now: Date;
  timeZone: string;
  dailyPlanHour: number;
  recoatWarningHours: number;
  users: UserEntity[];
  /**
   * Coats whose notifications are already recorded for these users (`parts-ready:<coat id>`,
   * `recoat-closing:<coat id>`): deciding them again would only record the same keys again.
   */
  settled?: ReadonlySet<string>;
}

// Coats are decided a chunk at a time, with a pause between, so a busy day never holds the event loop for long.
const coatsPerChunk = 100;
const pause = () => new Promise<void>((resolve) => setImmediate(resolve));

const dayMs = 86_400_000;
const wants = (user: UserEntity, kind: NotificationKind) => !user.disabled && notifyPrefsOf(user.role, user.notify)[kind];
const at = (iso: string, ctx: RuleContext) => wallClockIn(new Date(iso), ctx.timeZone).time;
/** An admin hears about every site; everyone else about their own. */
const ofSite = (user: UserEntity, siteId: number | undefined) => seesAllSites(user.role) || user.siteId === siteId;

/** The site of each spray session's booth. */
async function spraySessionSites(ctx: RuleContext, spraySessions: Pick<SpraySessionEntity, 'boothId'>[]): Promise<Map<number, number>> {
  const boothIds = [...new Set(spraySessions.map((s) => s.boothId))];
  const booths = boothIds.length ? await ctx.data.booths.findBy({ id: In(boothIds) }) : [];
  return new Map(booths.map((b) => [b.id, b.siteId]));
}

/** Coats (current versions) whose `column` instant lies in (from, to], less those already settled. */
async function coatsBetween(ctx: RuleContext, column: 'handleAt' | 'recoatClosesAt', from: Date, to: Date, settledAs: string) {
  const sqlColumn = column === 'handleAt' ? 'handle_at' : 'recoat_closes_at';
  const coats = await ctx.data.coats
    .select('c')
    .leftJoin('coats', 'n', 'n.replaces_id = c.id')
    .where('n.id IS NULL')
    .andWhere(`c.${sqlColumn} > :from AND c.${sqlColumn} <= :to`, { from: from.toISOString(), to: to.toISOString() })
    .getMany();
  return coats.filter((c) => !ctx.settled?.has(`${settledAs}:${c.id}`));
}

/** Some coats with their parts, jobs and site, and the readiness of all their parts read at once. */
async function withParts(ctx: RuleContext, coats: CoatEntity[]) {
  const links = coats.length ? await ctx.data.coatParts.findBy({ coatId: In(coats.map((c) => c.id)) }) : [];
  const parts = links.length ? await ctx.data.parts.findBy({ id: In([...new Set(links.map((l) => l.partId))]) }) : [];
  const jobs = parts.length ? await ctx.data.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) }) : [];
  const spraySessions = coats.length ? await ctx.data.spraySessions.findBy({ id: In([...new Set(coats.map((c) => c.spraySessionId))]) }) : [];
  const boothSite = await spraySessionSites(ctx, spraySessions);
  const siteOfSession = new Map(spraySessions.map((s) => [s.id, boothSite.get(s.boothId)]));
  const jobById = new Map(jobs.map((j) => [j.id, j]));
  const partIdsOfCoat = new Map<number, Set<number>>();
  for (const link of links) partIdsOfCoat.set(link.coatId, (partIdsOfCoat.get(link.coatId) ?? new Set()).add(link.partId));
  const found = coats.map((coat) => {
    const ids = partIdsOfCoat.get(coat.id);
    const own = ids ? parts.filter((p) => ids.has(p.id)) : [];
    return { coat, parts: own, job: own.length ? jobById.get(own[0].jobId) : undefined, siteId: siteOfSession.get(coat.spraySessionId) };
  });
  return { found, readiness: await readinessOf(ctx.data, parts, ctx.now) };
}

type Found = Awaited<ReturnType<typeof withParts>>;

/** Decides each coat found, a chunk at a time. */
async function decideInChunks(ctx: RuleContext, coats: CoatEntity[], decide: (found: Found) => DueNotification[]): Promise<DueNotification[]> {
  const due: DueNotification[] = [];
  for (let i = 0; i < coats.length; i += coatsPerChunk) {
    if (i > 0) await pause();
    due.push(...decide(await withParts(ctx, coats.slice(i, i + coatsPerChunk))));
  }
  return due;
}

/** The last coat of the system is on and the parts have reached handling time. */
export async function partsReady(ctx: RuleContext): Promise<DueNotification[]> {
  const coats = await coatsBetween(ctx, 'handleAt', new Date(ctx.now.getTime() - dayMs), ctx.now, 'parts-ready');
  return decideInChunks(ctx, coats, ({ found, readiness }) =>
    found.flatMap(({ coat, parts, job, siteId }) => {
      const finished = parts.filter((p) => ['ready-to-handle', 'ready-to-pack', 'cured'].includes(readiness.get(p.id)!.state));
      if (!job || finished.length === 0) return [];
      const subject = `Ready to handle: ${job.reference} (${job.customer})`;
      const body = `${finished.length} part(s) of job ${job.reference} for ${job.customer} can be handled since ${at(coat.handleAt, ctx)}:\n${finished.map((p) => `- ${p.label}`).join('\n')}\n\nCheck the film before stacking; pack after ${at(coat.packAt, ctx)}.`;
      return ctx.users
        .filter((u) => wants(u, 'parts-ready') && ofSite(u, siteId))
        .map((user) => ({ dedupeKey: `parts-ready:${coat.id}:${user.id}`, kind: 'parts-ready' as const, userId: user.id, subject, body, dueAt: coat.handleAt }));
    }),
  );
}

/** A recoat window closes soon and the parts are still waiting for their next coat. */
export async function recoatClosing(ctx: RuleContext): Promise<DueNotification[]> {
  const coats = await coatsBetween(ctx, 'recoatClosesAt', ctx.now, new Date(ctx.now.getTime() + ctx.recoatWarningHours * 3_600_000), 'recoat-closing');
  return decideInChunks(ctx, coats, ({ found, readiness }) =>
    found.flatMap(({ coat, parts, job, siteId }) => {
      const waiting = parts.filter((p) => readiness.get(p.id)!.nextWindow?.closesAt?.toISOString() === coat.recoatClosesAt);
      if (!job || waiting.length === 0) return [];
      const subject = `Recoat window closing ${at(coat.recoatClosesAt!, ctx)}: ${job.reference}`;
      const body = `${waiting.length} part(s) of ${job.reference} are waiting for their next coat. After ${at(coat.recoatClosesAt!, ctx)} they will need a P320 denib first:\n${waiting.map((p) => `- ${p.label}`).join('\n')}`;
      return ctx.users
        .filter((u) => wants(u, 'recoat-closing') && ofSite(u, siteId))
        .map((user) => ({ dedupeKey: `recoat-closing:${coat.id}:${user.id}`, kind: 'recoat-closing' as const, userId: user.id, subject, body, dueAt: ctx.now.toISOString() }));
    }),
  );
}

/** Each booking, move or cancellation of a sprayer's session in the last day, once per version. */
export async function spraySessionChanges(ctx: RuleContext): Promise<DueNotification[]> {
  const spraySessions = await ctx.data.spraySessions.find({ where: { updatedAt: MoreThan(new Date(ctx.now.getTime() - dayMs).toISOString()) } });
  return spraySessions.flatMap((s) => {
    const user = ctx.users.find((u) => u.id === s.sprayerId);
    if (!user || !wants(user, 'session-changed') || ['spraying', 'clearing', 'done', 'checking'].includes(s.state)) return [];
    const what = s.state === 'cancelled' ? 'cancelled' : 'booked or moved';
    const when = `${calendarDateIn(new Date(s.startAt), ctx.timeZone)} ${at(s.startAt, ctx)}–${at(s.endAt, ctx)}`;
    return [{ dedupeKey: `session:${s.id}:${s.updatedAt}:${s.state}`, kind: 'session-changed' as const, userId: user.id, subject: `Spray session ${what}: ${when}`, body: `Spray session ${s.id} is ${what}: ${when}.`, dueAt: s.updatedAt }];
  });
}

/** Once a day, at the shop's set hour, the day's spray sessions of each user's site. */
export async function dailyPlan(ctx: RuleContext): Promise<DueNotification[]> {
  const clock = wallClockIn(ctx.now, ctx.timeZone);
  if (Number(clock.time.slice(0, 2)) < ctx.dailyPlanHour) return [];
  const spraySessions = await ctx.data.spraySessions.find({
    where: { startAt: LessThanOrEqual(new Date(ctx.now.getTime() + dayMs).toISOString()), endAt: MoreThan(ctx.now.toISOString()) },
    order: { startAt: 'ASC' },
  });
  const today = spraySessions.filter((s) => s.state !== 'cancelled' && calendarDateIn(new Date(s.startAt), ctx.timeZone) === clock.date);
  const boothSite = await spraySessionSites(ctx, today);
  const linesFor = (user: UserEntity) => {
    const own = today.filter((s) => ofSite(user, boothSite.get(s.boothId)));
    return own.length ? own.map((s) => `- ${at(s.startAt, ctx)}–${at(s.endAt, ctx)}: session ${s.id} (booth ${s.boothId})`).join('\n') : 'No spray sessions are booked today.';
  };
  return ctx.users
    .filter((u) => wants(u, 'daily-plan'))
    .map((u) => ({ dedupeKey: `daily-plan:${clock.date}:${u.id}`, kind: 'daily-plan' as const, userId: u.id, subject: `Today’s booth plan, ${clock.date}`, body: linesFor(u), dueAt: ctx.now.toISOString() }));
}

export const notificationRules = [partsReady, recoatClosing, spraySessionChanges, dailyPlan, upkeepDue, crewDue];
