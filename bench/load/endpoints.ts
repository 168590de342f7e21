import { randomBytes } from 'node:crypto';
import type { SignedIn } from '../server/app-server';
import { partIdsOf } from '../seed/job-rows';
import { jobProgress, sessionsOn } from '../seed/shop-plan';
import type { SyntheticShop } from '../seed/synthetic-shop';
import type { Target } from './measure';

export const reportPath = '/api/reports/booth-use';

const isoDate = (ms: number) => new Date(ms).toISOString().slice(0, 10);
// As a browser over HTTPS asks (over plain HTTP it leaves out br, and big answers go gzipped, about a third bigger).
const readHeaders = (auth: SignedIn) => ({ cookie: auth.cookie, 'accept-encoding': 'gzip, deflate, br' });

/** A job of the second system that started two working days ago: in finish now, a few coats on. */
export function jobInFinish(shop: SyntheticShop): number {
  const seq = (shop.timeline.todayIndex - 2) * shop.refs.systems.length + 1;
  return shop.refs.nextId.jobs + seq;
}

/** The reads a shop makes all day, as the client asks for them. */
export function readTargets(shop: SyntheticShop, auth: SignedIn): Target[] {
  const { days, todayIndex, now } = shop.timeline;
  const monday = Math.floor(todayIndex / 5) * 5;
  const week = { from: new Date(days[monday].midnightMs).toISOString(), to: new Date(days[monday + 5].midnightMs).toISOString() };
  const headers = readHeaders(auth);
  return [
    { name: "calendar, this week", method: 'GET', path: `/api/spray-sessions?from=${week.from}&to=${week.to}&pageSize=1000`, headers },
    { name: 'ready board', method: 'GET', path: '/api/ready', headers },
    { name: 'ready board, wall summary', method: 'GET', path: '/api/ready/summary', headers },
    { name: 'coat log p1, one job', method: 'GET', path: `/api/coats?jobId=${jobInFinish(shop)}&history=false&page=1&pageSize=25`, headers },
    { name: 'report: booth use, 4 weeks', method: 'GET', path: `${reportPath}?from=${isoDate(now.getTime() - 28 * 86_400_000)}&to=${isoDate(now.getTime())}`, headers },
  ];
}

/** The spray session that started last before now: the one a sprayer is logging coats on. */
function currentSession(shop: SyntheticShop): number {
  const { timeline, refs } = shop;
  const nowMs = timeline.now.getTime();
  for (let day = timeline.todayIndex; day >= 0; day -= 1) {
    const started = sessionsOn(day, timeline, refs).filter((s) => s.startMs <= nowMs).sort((a, b) => b.startMs - a.startMs)[0];
    if (started) return refs.nextId.spray_sessions + day * refs.systems.reduce((n, s) => n + s.coats.length, 0) + started.slot;
  }
  throw new Error('the synthetic shop has no spray session before now');
}

/** Parts of the jobs in finish, each with the product of its job's next coat. */
function partsInFinish(shop: SyntheticShop): { partId: number; productId: number }[] {
  const { timeline, refs } = shop;
  const jobs = refs.systems.length;
  const parts: { partId: number; productId: number }[] = [];
  for (let seq = (timeline.todayIndex - 5) * jobs; seq < (timeline.todayIndex + 1) * jobs; seq += 1) {
    const progress = jobProgress(seq, timeline, refs);
    const coats = refs.systems[seq % jobs].coats;
    const productId = coats[Math.min(progress.coatsDone, coats.length - 1)].productId;
    for (const partId of partIdsOf(seq, refs)) parts.push({ partId, productId });
  }
  return parts;
}

/** POST /api/coats as the booth tablet sends it: one part per coat, each with its own idempotency key. */
export function coatCreationTarget(shop: SyntheticShop, auth: SignedIn): Target {
  const spraySessionId = currentSession(shop);
  const parts = partsInFinish(shop);
  const run = randomBytes(4).toString('hex');
  let sent = 0;
  const body = () => {
    const { partId, productId } = parts[sent % parts.length];
    sent += 1;
    return JSON.stringify({
      spraySessionId,
      partIds: [partId],
      productId,
      sprayedAt: new Date().toISOString(),
      airTempC: 20.5,
      relativeHumidityPct: 55,
      surfaceTempC: 19.8,
      thinningPct: 10,
      wetFilmUm: 110,
      idempotencyKey: `bench-${run}-${sent}`,
    });
  };
  return { name: 'coat creation (POST)', method: 'POST', path: '/api/coats', headers: { ...readHeaders(auth), 'content-type': 'application/json', 'x-csrf-token': auth.csrfToken }, body };
}

/** Whether the report route exists yet: an unknown /api route answers 404 not_found. */
export async function routeExists(base: string, target: Target): Promise<boolean> {
  const res = await fetch(`${base}${target.path}`, { headers: target.headers });
  return res.status !== 404;
}
