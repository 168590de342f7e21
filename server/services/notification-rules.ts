import { In, LessThanOrEqual, MoreThan } from 'typeorm';
import { seesAllSites } from '../../shared/permissions';
import { notifyPrefsOf, type NotificationKind } from '../../shared/schemas/notification';
import { calendarDateIn, wallClockIn } from '../../shared/time';
import { denibWords, shopDateWords, shopSpanWords, type ShopFormat } from '../../shared/words';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import type { UserEntity } from '../db/entities/user.entity';
import { coatSentence, momentWords, namesFor, partList, partsOfJob, timeWords, type CoatStory } from './notification-words';
import { stepsByJob } from './part-coats';
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
  /** The shop's zone and locale: every time in an e-mail is shop time, written as the shop writes it. */
  shop: ShopFormat;
  /** Where people open the app, for a link to the page an e-mail is about. */
  publicUrl: string;
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
const link = (ctx: RuleContext, path: string) => `${ctx.publicUrl}${path}`;
/** An admin hears about every site; everyone else about their own. */
const ofSite = (user: UserEntity, siteId: number | undefined) => seesAllSites(user.role) || user.siteId === siteId;

/** The site of each spray session's booth. */
async function spraySessionSites(ctx: RuleContext, spraySessions: Pick<SpraySessionEntity, 'boothId'>[]): Promise<Map<number, number>> {
  const boothIds = [...new Set(spraySessions.map((s) => s.boothId))];
  const booths = boothIds.length ? await ctx.data.booths.findBy({ id: In(boothIds) }) : [];
  return new Map(booths.map((b) => [b.id, b.siteId]));
}

async function boothNames(ctx: RuleContext, spraySessions: Pick<SpraySessionEntity, 'boothId'>[]): Promise<Map<number, string>> {
  const ids = [...new Set(spraySessions.map((s) => s.boothId))];
  const booths = ids.length ? await ctx.data.booths.findBy({ id: In(ids) }) : [];
  return new Map(booths.map((b) => [b.id, b.name]));
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

/** Some coats with their parts, job, site, booth and product, and the readiness of all their parts read at once. */
async function withParts(ctx: RuleContext, coats: CoatEntity[]): Promise<{ found: CoatStory[]; readiness: Awaited<ReturnType<typeof readinessOf>> }> {
  const links = coats.length ? await ctx.data.coatParts.findBy({ coatId: In(coats.map((c) => c.id)) }) : [];
  const parts = links.length ? await ctx.data.parts.findBy({ id: In([...new Set(links.map((l) => l.partId))]) }) : [];
  const jobs = parts.length ? await ctx.data.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) }) : [];
  const spraySessions = coats.length ? await ctx.data.spraySessions.findBy({ id: In([...new Set(coats.map((c) => c.spraySessionId))]) }) : [];
  const boothSite = await spraySessionSites(ctx, spraySessions);
  const siteOfSession = new Map(spraySessions.map((s) => [s.id, boothSite.get(s.boothId)]));
  const jobById = new Map(jobs.map((j) => [j.id, j]));
  const boothOfSession = new Map(spraySessions.map((s) => [s.id, s.boothId]));
  // Read once per chunk: every coat's sentence says which coat of its job's system it was.
  const [names, steps] = await Promise.all([namesFor(ctx.data, coats, boothOfSession), stepsByJob(ctx.data, parts)]);
  const partIdsOfCoat = new Map<number, Set<number>>();
  for (const link of links) partIdsOfCoat.set(link.coatId, (partIdsOfCoat.get(link.coatId) ?? new Set()).add(link.partId));
  const found = coats.map((coat) => {
    const ids = partIdsOfCoat.get(coat.id);
    const own = ids ? parts.filter((p) => ids.has(p.id)) : [];
    const boothName = names.booths.get(boothOfSession.get(coat.spraySessionId) ?? -1) ?? 'the booth';
    const productName = names.products.get(coat.productId) ?? 'the product';
    return { coat, parts: own, job: own.length ? jobById.get(own[0].jobId) : undefined, siteId: siteOfSession.get(coat.spraySessionId), boothName, productName, steps: own.length ? (steps.get(own[0].jobId) ?? []) : [] };
  });
  return { found, readiness: await readinessOf(ctx.data, parts, ctx.now) };
}

type Found = Awaited<ReturnType<typeof withParts>>;

/** Decides each coat found, a chunk at a time. */
async function decideInChunks(ctx: RuleContext, coats: CoatEntity[], decide: (story: CoatStory, readiness: Found['readiness']) => DueNotification[]): Promise<DueNotification[]> {
  const due: DueNotification[] = [];
  for (let i = 0; i < coats.length; i += coatsPerChunk) {
    if (i > 0) await pause();
    const { found, readiness } = await withParts(ctx, coats.slice(i, i + coatsPerChunk));
    for (const story of found) due.push(...decide(story, readiness));
  }
  return due;
}

/** The last coat of the system is on and the parts have reached handling time. */
export async function partsReady(ctx: RuleContext): Promise<DueNotification[]> {
  const coats = await coatsBetween(ctx, 'handleAt', new Date(ctx.now.getTime() - dayMs), ctx.now, 'parts-ready');
  return decideInChunks(ctx, coats, (story, readiness) => {
    const { coat, parts, job, siteId } = story;
    const finished = parts.filter((p) => ['ready-to-handle', 'ready-to-pack', 'cured'].includes(readiness.get(p.id)!.state));
    if (!job || finished.length === 0) return [];
    const subject = `Ready to handle: ${job.reference} (${job.customer})`;
    const body = [
      `${partsOfJob(finished.length, job)} can be handled since ${momentWords(coat.handleAt, ctx.shop)}, after ${coatSentence(story, ctx.shop)}:`,
      partList(finished),
      '',
      `Check the film before stacking; pack from ${momentWords(coat.packAt, ctx.shop)}.`,
      `Ready board: ${link(ctx, `/ready?jobId=${job.id}`)}`,
    ].join('\n');
    return ctx.users
      .filter((u) => wants(u, 'parts-ready') && ofSite(u, siteId))
      .map((user) => ({ dedupeKey: `parts-ready:${coat.id}:${user.id}`, kind: 'parts-ready' as const, userId: user.id, subject, body, dueAt: coat.handleAt }));
  });
}

/** A recoat window closes soon and the parts are still waiting for their next coat. */
export async function recoatClosing(ctx: RuleContext): Promise<DueNotification[]> {
  const coats = await coatsBetween(ctx, 'recoatClosesAt', ctx.now, new Date(ctx.now.getTime() + ctx.recoatWarningHours * 3_600_000), 'recoat-closing');
  return decideInChunks(ctx, coats, (story, readiness) => {
    const { coat, parts, job, siteId } = story;
    const waiting = parts.filter((p) => readiness.get(p.id)!.nextWindow?.closesAt?.toISOString() === coat.recoatClosesAt);
    if (!job || waiting.length === 0) return [];
    const subject = `Recoat window closing ${timeWords(coat.recoatClosesAt!, ctx.shop)}: ${job.reference} (${job.customer})`;
    const body = [
      `${partsOfJob(waiting.length, job)} are waiting for their next coat after ${coatSentence(story, ctx.shop)}.`,
      `The recoat window closes ${momentWords(coat.recoatClosesAt!, ctx.shop)}; after that they need a ${denibWords('P320')} first:`,
      partList(waiting),
      '',
      `Book the next coat: ${link(ctx, `/planner`)}`,
      `The job: ${link(ctx, `/jobs/${job.id}`)}`,
    ].join('\n');
    return ctx.users
      .filter((u) => wants(u, 'recoat-closing') && ofSite(u, siteId))
      .map((user) => ({ dedupeKey: `recoat-closing:${coat.id}:${user.id}`, kind: 'recoat-closing' as const, userId: user.id, subject, body, dueAt: ctx.now.toISOString() }));
  });
}

/** Each booking, move or cancellation of a sprayer's session in the last day, once per version. */
export async function spraySessionChanges(ctx: RuleContext): Promise<DueNotification[]> {
  const spraySessions = await ctx.data.spraySessions.find({ where: { updatedAt: MoreThan(new Date(ctx.now.getTime() - dayMs).toISOString()) } });
  const booths = await boothNames(ctx, spraySessions);
  return spraySessions.flatMap((s) => {
    const user = ctx.users.find((u) => u.id === s.sprayerId);
    if (!user || !wants(user, 'session-changed') || ['spraying', 'clearing', 'done', 'checking'].includes(s.state)) return [];
    const what = s.state === 'cancelled' ? 'cancelled' : 'booked or moved';
    const booth = booths.get(s.boothId) ?? 'the booth';
    const when = shopSpanWords(new Date(s.startAt), new Date(s.endAt), ctx.shop);
    const body = `Your spray session in ${booth}, ${when}, is ${what}.\n\nThe session: ${link(ctx, `/spray-sessions/${s.id}`)}`;
    return [{ dedupeKey: `session:${s.id}:${s.updatedAt}:${s.state}`, kind: 'session-changed' as const, userId: user.id, subject: `Spray session ${what}: ${booth}, ${when}`, body, dueAt: s.updatedAt }];
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
  const booths = await boothNames(ctx, today);
  const linesFor = (user: UserEntity) => {
    const own = today.filter((s) => ofSite(user, boothSite.get(s.boothId)));
    const lines = own.map((s) => `- ${timeWords(s.startAt, ctx.shop)}–${timeWords(s.endAt, ctx.shop)}: ${booths.get(s.boothId) ?? 'a booth'} (${link(ctx, `/spray-sessions/${s.id}`)})`);
    return own.length ? `${lines.join('\n')}\n\nThe planner: ${link(ctx, '/planner')}` : 'No spray sessions are booked today.';
  };
  const day = shopDateWords(ctx.now, ctx.shop);
  return ctx.users
    .filter((u) => wants(u, 'daily-plan'))
    .map((u) => ({ dedupeKey: `daily-plan:${clock.date}:${u.id}`, kind: 'daily-plan' as const, userId: u.id, subject: `Today’s booth plan, ${day}`, body: linesFor(u), dueAt: ctx.now.toISOString() }));
}

export const notificationRules = [partsReady, recoatClosing, spraySessionChanges, dailyPlan, upkeepDue, crewDue];
