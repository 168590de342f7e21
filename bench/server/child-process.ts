import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import fs from 'node:fs';
import { build } from 'esbuild';

/** What bench/server/probe.mjs, inside the measured server, answers. */
export interface ProbeFigures {
  type: 'probe';
  /** The longest the event loop was held at once since the last read. */
  loopMaxMs: number;
  serverP50Ms: number;
  serverP99Ms: number;
  /** CPU time (user + system) of the whole process per answered request. */
  cpuMsPerRequest: number;
  requests: number;
}

const probe = path.resolve('bench', 'server', 'probe.mjs');

export interface RunningChild {
  base: string;
  pid: number;
  /** The server's own figures since the last read (bench/server/probe.ts). */
  probe(): Promise<ProbeFigures>;
  stop(): Promise<void>;
}

/** Asks the probe inside the child for its figures. */
export function readProbe(child: ChildProcess): Promise<ProbeFigures> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not answer the probe')), 120_000);
    const answer = (message: unknown) => {
      if ((message as ProbeFigures)?.type !== 'probe') return;
      clearTimeout(timer);
      child.off('message', answer);
      resolve(message as ProbeFigures);
    };
    child.on('message', answer);
    child.send('probe:read');
  });
}

export const builtServer = path.join('dist-server', 'index.js');

// The same V8 limits as `npm run serve`: a small young generation keeps the resident set down and
// served cached reads faster here; first reads after a change cost about a tenth more.
const v8Limits = ['--max-old-space-size=256', '--max-semi-space-size=4'];
// Also as `npm run serve`: two malloc arenas, not one per thread that compresses or reads (see README, Performance).
const mallocEnv = (env: NodeJS.ProcessEnv) => ({ MALLOC_ARENA_MAX: '2', ...env });

/** The built server (`npm run build`) under plain Node with the probe, as `npm run serve` runs it. */
export function spawnBuiltServer(env: NodeJS.ProcessEnv): { child: ChildProcess; stderr: () => string } {
  if (!fs.existsSync(builtServer)) throw new Error(`${builtServer} is missing: run npm run build first`);
  // BENCH_NODE_FLAGS adds flags Node refuses in NODE_OPTIONS, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof" to profile.
  const extra = (process.env.BENCH_NODE_FLAGS ?? '').split(' ').filter(Boolean);
  return withStderr(spawn(process.execPath, [...v8Limits, ...extra, '--import', probe, builtServer], { env: mallocEnv(env), stdio: ['ignore', 'ignore', 'pipe', 'ipc'] }));
}

/**
 * A bench-only TypeScript entry compiled to plain JavaScript (under node_modules/.cache, so its
 * imports resolve to the project's packages) and run as the app is: plain Node, the same V8
 * limits and malloc arenas, the probe. A TypeScript loader in the yardstick would add its own ~50 MB and CPU.
 */
export async function spawnBuiltScript(entry: string, env: NodeJS.ProcessEnv, args: string[] = []): Promise<{ child: ChildProcess; stderr: () => string }> {
  const outfile = path.resolve('node_modules', '.cache', 'boothwright-bench', `${path.basename(entry, '.ts')}.mjs`);
  await build({ entryPoints: [entry], outfile, bundle: true, packages: 'external', platform: 'node', format: 'esm', target: 'node20', logLevel: 'warning' });
  return withStderr(spawn(process.execPath, [...v8Limits, '--import', probe, outfile, ...args], { env: mallocEnv(env), stdio: ['ignore', 'ignore', 'pipe', 'ipc'] }));
}

function withStderr(child: ChildProcess): { child: ChildProcess; stderr: () => string } {
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => {
    stderr = (stderr + chunk.toString()).slice(-4000);
  });
  return { child, stderr: () => stderr };
}

/** Waits until `url` answers 200, or fails with what the child printed. */
export async function waitUntilUp(url: string, child: ChildProcess, stderr: () => string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`${url}: the process exited (${child.exitCode}) before answering:\n${stderr()}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // Not listening yet.
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s:\n${stderr()}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** SIGTERM, then SIGKILL if the process has not gone after a few seconds. */
export function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const kill = setTimeout(() => child.kill('SIGKILL'), 8000);
    child.once('exit', () => {
      clearTimeout(kill);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
