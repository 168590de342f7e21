import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { serverTimeAlone, type Target } from './load/measure';
import { signIn, startAppServer } from './server/app-server';
import { startBareServer } from './server/bare-server';

/**
 * `npm run bench:guard` (run by .ci/run after the build): a regression guard, not a benchmark.
 * On the demo shop it times, inside the built server with the response cache off, each read a
 * shop makes all day, one request at a time, and compares it with the bare Express +
 * better-sqlite3 endpoint timed the same way in the same run, so a loaded machine slows both. It
 * fails only when a read costs more than its limit times the bare endpoint: far above what the
 * reads cost now (see the printed ratios), so only a read gone badly wrong (a query per row, a
 * lost index) trips it. The bare time counts as at least `bareFloorMs`, so a very quiet machine,
 * where the bare endpoint is far quicker, does not make every ratio look worse.
 */
const limit = 200;
// The ready board works out every part's readiness on each uncached read: 200–350× the bare
// endpoint on the demo shop now, so its own limit; lower it when readiness is stored per part.
const readyBoardLimit = 3000;
const bareFloorMs = 0.25;
const seconds = Number(process.env.BENCH_GUARD_SECONDS ?? 2);
const ports = {
  bare: Number(process.env.BENCH_GUARD_PORT ?? 3402),
  app: Number(process.env.BENCH_GUARD_PORT ?? 3402) + 1,
};
const lead = { email: 'lead@larchmere.test', password: 'finish-demo-2026' };
const day = 86_400_000;

type GuardedRead = Target & { limit: number };

function demoReads(headers: Record<string, string>): GuardedRead[] {
  const now = Date.now();
  const date = (ms: number) => new Date(ms).toISOString().slice(0, 10);
  const read = (name: string, url: string, most = limit): GuardedRead => ({
    name,
    method: 'GET',
    path: url,
    headers,
    limit: most,
  });
  return [
    read(
      'calendar, this week',
      `/api/spray-sessions?from=${new Date(now - 3 * day).toISOString()}&to=${new Date(now + 4 * day).toISOString()}&pageSize=1000`,
    ),
    read('ready board', '/api/ready', readyBoardLimit),
    read('coat log page 1', '/api/coats?page=1&pageSize=25'),
    read('report: booth use, 4 weeks', `/api/reports/booth-use?from=${date(now - 28 * day)}&to=${date(now)}`),
    read('jobs in work', '/api/jobs?state=active'),
  ];
}

function seedDemoShop(dir: string): NodeJS.ProcessEnv {
  const env = {
    ...process.env,
    DATABASE_PATH: path.join(dir, 'guard.sqlite'),
    DATABASE_URL: '',
    UPLOAD_DIR: path.join(dir, 'uploads'),
  };
  execFileSync(process.execPath, ['dist-server/cli.js', 'seed'], { env, stdio: 'ignore' });
  return env;
}

async function main(): Promise<void> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'bench-guard-'));
  const env = seedDemoShop(dir);
  const bare = await startBareServer(ports.bare, dir);
  const app = await startAppServer({
    databasePath: env.DATABASE_PATH!,
    uploadDir: env.UPLOAD_DIR!,
    port: ports.app,
    clientDir: path.join(dir, 'no-client'),
    env: { RESPONSE_CACHE_MB: '0' },
  });
  let failed = false;
  try {
    const bareMs = await serverTimeAlone(bare, { name: 'bare', method: 'GET', path: '/one', headers: {} }, seconds);
    console.log(
      `bench guard: each read's server time with no cache, one at a time, against the bare endpoint's ${bareMs.toFixed(2)} ms (counted as at least ${bareFloorMs} ms)`,
    );
    const auth = await signIn(app.base, lead.email, lead.password);
    for (const target of demoReads({ cookie: auth.cookie })) {
      const res = await fetch(`${app.base}${target.path}`, { headers: target.headers });
      if (res.status !== 200)
        throw new Error(`${target.name}: ${target.path} answered ${res.status}: ${(await res.text()).slice(0, 200)}`);
      const ms = await serverTimeAlone(app, target, seconds);
      const ratio = ms / Math.max(bareMs, bareFloorMs);
      failed ||= ratio > target.limit;
      console.log(
        `  ${target.name.padEnd(28)} ${ms.toFixed(2).padStart(8)} ms  ${ratio.toFixed(1).padStart(6)}×  (limit ${target.limit}×)  ${ratio > target.limit ? 'TOO SLOW' : 'ok'}`,
      );
    }
  } finally {
    await Promise.all([app.stop(), bare.stop()]);
    fs.rmSync(dir, { recursive: true, force: true });
  }
  if (failed) {
    console.error('bench guard: a read took more than its limit times the bare endpoint’s server time');
    process.exit(1);
  }
}

main().catch((error: Error) => {
  console.error(error.stack ?? error.message);
  process.exit(1);
});
