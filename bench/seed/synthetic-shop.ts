import path from 'node:path';
import { seedBaseShop, type ShopRefs } from './base-shop';
import { insertVolume, type RowCounts } from './bulk-insert';
import { settleNotifications } from './notification-backlog';
import { buildTimeline, type Timeline } from './timeline';

export interface SyntheticShop {
  databasePath: string;
  uploadDir: string;
  refs: ShopRefs;
  timeline: Timeline;
}

export interface SeedResult {
  counts: RowCounts;
  seconds: number;
}

// The demo shop's time zone (server/db/seed.ts): opening hours and working days are on its clock.
const shopTimeZone = 'Europe/London';
// A day's sessions include later coats of jobs started up to (longest system − 1) working days before.
const lookBackDays = (refs: ShopRefs) => Math.max(...refs.systems.map((s) => s.coats.length)) - 1;

/**
 * A fresh database: migrations, the demo shop, one year of synthetic work up to next week's
 * plan, and the notifications that work made due recorded as sent.
 */
export async function createSyntheticShop(dir: string, now: Date): Promise<SyntheticShop & SeedResult> {
  const started = performance.now();
  const databasePath = path.join(dir, 'boothwright.sqlite');
  const uploadDir = path.join(dir, 'uploads');
  const refs = await seedBaseShop(databasePath, uploadDir);
  const timeline = buildTimeline(now, shopTimeZone);
  const last = timeline.days.length - 1;
  const counts = insertVolume(databasePath, timeline, refs, { jobs: [timeline.oneYearFrom - lookBackDays(refs), last], work: [timeline.oneYearFrom, last] });
  await settleNotifications(databasePath, now);
  return { databasePath, uploadDir, refs, timeline, counts, seconds: (performance.now() - started) / 1000 };
}

/** Adds the nine years before the first one to the same database: ten years in all. */
export function growToTenYears(shop: SyntheticShop): SeedResult {
  const started = performance.now();
  const { oneYearFrom } = shop.timeline;
  const counts = insertVolume(shop.databasePath, shop.timeline, shop.refs, { jobs: [0, oneYearFrom - lookBackDays(shop.refs) - 1], work: [0, oneYearFrom - 1] });
  return { counts, seconds: (performance.now() - started) / 1000 };
}
