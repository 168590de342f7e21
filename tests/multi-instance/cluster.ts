import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { processEnv, startServerProcess } from '../helpers/server-process';

/** One real server process and everything it printed (pino's JSON lines at LOG_LEVEL=debug). */
export interface Instance {
  name: string;
  /** Its own folder (SQLite path and uploads, both unused on PostgreSQL with S3). */
  dir: string;
  base: string;
  child: ChildProcess;
  output: string[];
  /** The notification scheduler's ticks this instance has finished so far. */
  ticks(): number;
}

/** The environment of one instance: its own port and upload folder, the shared database, mail and bucket. */
export function instanceEnv(port: number, shared: Record<string, string>): NodeJS.ProcessEnv {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), `boothwright-instance-${port}-`));
  return { ...processEnv(dir, port), LOG_LEVEL: 'debug', ...shared };
}

/**
 * `npm run db:seed` for the shared database, without blocking this process: the fake S3 it
 * writes the demo data sheet to runs in this process and must keep answering.
 */
export function seedAsync(env: NodeJS.ProcessEnv): Promise<void> {
  const child = spawn('node_modules/.bin/tsx', ['--tsconfig', 'tsconfig.server.json', 'server/db/cli.ts', 'seed'], { env, stdio: ['ignore', 'ignore', 'pipe'] });
  let errors = '';
  child.stderr.on('data', (chunk: Buffer) => (errors += chunk.toString()));
  return new Promise((resolve, reject) => child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`seed failed: ${errors}`)))));
}

export async function startInstance(name: string, env: NodeJS.ProcessEnv): Promise<Instance> {
  const output: string[] = [];
  const child = await startServerProcess(env, (text) => output.push(text)).catch((error: Error) => {
    throw new Error(`instance ${name}: ${error.message}\n${output.join('')}`);
  });
  const ticks = () => output.join('').split('\n').filter((line) => line.includes('"msg":"notification tick"')).length;
  return { name, dir: path.dirname(env.DATABASE_PATH!), base: `http://127.0.0.1:${env.PORT}`, child, output, ticks };
}

export async function stopInstance(instance: Instance | undefined, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (!instance) return;
  if (instance.child.exitCode === null && instance.child.signalCode === null) {
    const exited = new Promise((resolve) => instance.child.once('exit', resolve));
    instance.child.kill(signal);
    await exited;
  }
  fs.rmSync(instance.dir, { recursive: true, force: true });
}

/** A signed-in browser in miniature: a session cookie and CSRF token that can be sent to any instance. */
export interface Session {
  cookie: string;
  csrf: string;
}

export async function signInAt(base: string, email: string, password = 'finish-demo-2026'): Promise<Session> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  let cookie = cookieOf(csrfRes, '');
  const csrf = ((await csrfRes.json()) as { token: string }).token;
  const login = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-csrf-token': csrf, cookie }, body: JSON.stringify({ email, password }) });
  if (!login.ok) throw new Error(`sign-in at ${base} failed: ${login.status}`);
  cookie = cookieOf(login, cookie);
  return { cookie, csrf };
}

function cookieOf(res: Response, previous: string): string {
  const set = res.headers.get('set-cookie');
  return set ? set.split(';')[0] : previous;
}

/** One API call with the session; a plain object body goes as JSON, FormData as multipart. */
export function call(base: string, session: Session, route: string, init: { method?: string; body?: object | FormData; signal?: AbortSignal; headers?: Record<string, string> } = {}): Promise<Response> {
  const json = init.body !== undefined && !(init.body instanceof FormData);
  return fetch(`${base}${route}`, {
    method: init.method ?? 'GET',
    headers: { cookie: session.cookie, 'x-csrf-token': session.csrf, ...(json ? { 'content-type': 'application/json' } : {}), ...init.headers },
    body: json ? JSON.stringify(init.body) : (init.body as FormData | undefined),
    signal: init.signal,
  });
}

/** Polls `check` until it is true; fails with `what` when it never becomes true. */
export async function waitUntil(what: string, check: () => boolean | Promise<boolean>, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error(`Gave up waiting: ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** GET /api/events as a stream of text; `received()` is everything so far. */
export async function openEventStream(base: string, session: Session): Promise<{ received(): string; close(): void }> {
  const abort = new AbortController();
  const res = await call(base, session, '/api/events', { signal: abort.signal });
  if (!res.ok || !res.body) throw new Error(`GET /api/events answered ${res.status}`);
  let text = '';
  const reader = res.body.getReader();
  const decoder = new TextDecoder();
  void (async () => {
    for (;;) {
      const { value, done } = await reader.read();
      if (done) return;
      text += decoder.decode(value, { stream: true });
    }
  })().catch(() => undefined);
  return { received: () => text, close: () => abort.abort() };
}
