import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { measureBundle } from './bundle-size';
import { coatCreationTarget, readTargets, reportPath, routeExists } from './load/endpoints';
import { measure, serverTimeAlone, type LoadResult, type LoadSettings, type Target } from './load/measure';
import { timeNotificationTicks, type TickTiming } from './notification-timing';
import { timePlanner } from './planner-timing';
import { heading, printBundle, printGrowth, printLoadTable, printPlanner, printSeed, printStalls, printTicks } from './report';
import { createSyntheticShop, growToTenYears, type SyntheticShop } from './seed/synthetic-shop';
import { signIn, startAppServer } from './server/app-server';
import { startBareServer } from './server/bare-server';

// BENCH_DURATION shortens each measurement for a quick look; the README's figures use the default.
const load: LoadSettings = { connections: 50, durationS: Number(process.env.BENCH_DURATION ?? 10), warmUpS: 2, aloneS: 2 };
const ports = { app: 3400, bare: 3401 };
const lead = { email: 'lead@larchmere.test', password: 'finish-demo-2026' };

type Line = LoadResult | { name: string; missing: string };

async function measureBare(dir: string): Promise<LoadResult> {
  const bare = await startBareServer(ports.bare, dir);
  try {
    return await measure(bare, { name: 'bare Express + better-sqlite3', method: 'GET', path: '/one', headers: {} }, load);
  } finally {
    await bare.stop();
  }
}

/** Starts the production server on the shop's database, signs in as the lead and measures each target. */
async function measureApp(shop: SyntheticShop, dir: string, withCoatCreation: boolean): Promise<Line[]> {
  const server = await startAppServer({ databasePath: shop.databasePath, uploadDir: shop.uploadDir, port: ports.app, clientDir: path.join(dir, 'no-client') });
  const lines: Line[] = [];
  try {
    const auth = await signIn(server.base, lead.email, lead.password);
    const targets: Target[] = [...readTargets(shop, auth), ...(withCoatCreation ? [coatCreationTarget(shop, auth)] : [])];
    for (const target of targets) {
      if (target.path.startsWith(reportPath) && !(await routeExists(server.base, target))) {
        lines.push({ name: target.name, missing: `not available (no ${reportPath} in this build)` });
        continue;
      }
      lines.push(await measure(server, target, load));
    }
  } finally {
    await server.stop();
  }
  await addUncachedTimes(shop, dir, measured(lines).filter((l) => isRead(l.name)));
  return lines;
}

/** The same reads one at a time on a server with the response cache off: what a first request costs. */
async function addUncachedTimes(shop: SyntheticShop, dir: string, reads: LoadResult[]): Promise<void> {
  const server = await startAppServer({ databasePath: shop.databasePath, uploadDir: shop.uploadDir, port: ports.app, clientDir: path.join(dir, 'no-client'), env: { RESPONSE_CACHE_MB: '0' } });
  try {
    const targets = readTargets(shop, await signIn(server.base, lead.email, lead.password));
    for (const line of reads) {
      const target = targets.find((t) => t.name === line.name);
      if (target) line.serverUncachedMs = await serverTimeAlone(server, target, load.aloneS);
    }
  } finally {
    await server.stop();
  }
}

/** The scheduler's check on a copy of the database: its ticks record notifications. */
async function timeTicksOnCopy(shop: SyntheticShop, dir: string): Promise<TickTiming> {
  const copy = path.join(dir, 'ticks.sqlite');
  fs.copyFileSync(shop.databasePath, copy);
  return timeNotificationTicks(copy, new Date(shop.timeline.now.getTime() + 60_000));
}

// Other work on the machine skews every figure; the load average says how much there was.
const loadAverage = () => `load average ${os.loadavg().map((n) => n.toFixed(1)).join(' ')}`;
const measured = (lines: Line[]) => lines.filter((l): l is LoadResult => !('missing' in l));
const isRead = (name: string) => !name.includes('POST');

async function main(): Promise<void> {
  const started = performance.now();
  console.log(`Boothwright benchmark · ${os.cpus().length} cores · Node ${process.version} · ${new Date().toISOString().slice(0, 16)} UTC · ${loadAverage()}`);
  console.log(`Production server (NODE_ENV=production, SQLite, logging at info) · autocannon ${load.connections} connections × ${load.durationS} s per line, after ${load.warmUpS} s warm-up`);
  console.log(`"alone" is the median latency of the same request sent one at a time for ${load.aloneS} s: the server's own cost, without queueing. Load figures are timed from the moment all ${load.connections} connections are open and answered once.`);
  console.log(`Inside the server (bench/server/probe.mjs): "srv ms" the median time from headers read to answer sent and "cpu ms" the process's CPU per request, both one at a time; "no-cache" the same "srv ms" on a server with the response cache off (RESPONSE_CACHE_MB=0), what a first request costs; "srv p99" the same time under the full load; "stall" the longest the event loop was held at once.`);
  const dir = fs.mkdtempSync('/tmp/bench-');
  // The server is measured as production runs it: built (dist-server/), under plain Node.
  execFileSync(process.execPath, ['scripts/build-server.mjs'], { stdio: 'inherit' });
  try {
    heading('Client bundle (vite build)');
    printBundle(measureBundle(path.join(dir, 'client')));
    heading('Auto-planner');
    printPlanner(timePlanner());

    heading('Seeding a fresh database');
    const shop = await createSyntheticShop(dir, new Date());
    printSeed('one year', shop.counts, shop.seconds, shop.refs.boothIds.length);
    const bare = await measureBare(dir);
    const oneYear = await measureApp(shop, dir, false);
    heading('One year of records');
    printLoadTable([bare, ...oneYear], bare, isRead);
    heading('Notification check (once a minute in the server), one year of records');
    printTicks(await timeTicksOnCopy(shop, dir));

    const grown = growToTenYears(shop);
    heading('Ten years of records');
    printSeed('nine earlier years added', grown.counts, grown.seconds, shop.refs.boothIds.length);
    // Coat creation last: the coats it adds would otherwise be in the ten-year reads and not in the one-year ones.
    const tenYears = await measureApp(shop, dir, true);
    printLoadTable(tenYears, bare, isRead);

    heading('Read latency growth, one year → ten years');
    printGrowth(measured(oneYear), measured(tenYears));
    heading('Event loop');
    printStalls(measured([...oneYear, ...tenYears]));
  } finally {
    if (!process.env.BENCH_KEEP) fs.rmSync(dir, { recursive: true, force: true });
  }
  console.log(`\nnpm run bench took ${((performance.now() - started) / 60_000).toFixed(1)} min · ${loadAverage()}.`);
}

main().catch((error: Error) => {
  console.error(error.stack ?? error.message);
  process.exit(1);
});
