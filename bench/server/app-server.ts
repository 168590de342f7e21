import { randomBytes } from 'node:crypto';
import { readProbe, spawnBuiltServer, stopChild, waitUntilUp, type RunningChild } from './child-process';

export interface AppServerOptions {
  databasePath: string;
  uploadDir: string;
  port: number;
  /** A folder without a built client: the API alone is measured. */
  clientDir: string;
  /** More settings, e.g. RESPONSE_CACHE_MB=0 to time every read worked out afresh. */
  env?: NodeJS.ProcessEnv;
}

/** The real production server, built (dist-server/index.js), on the bench database, as `npm run serve` starts it. */
export async function startAppServer(options: AppServerOptions): Promise<RunningChild> {
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'production',
    HOST: '127.0.0.1',
    PORT: String(options.port),
    DATABASE_PATH: options.databasePath,
    DATABASE_URL: '',
    UPLOAD_DIR: options.uploadDir,
    SESSION_SECRET: randomBytes(24).toString('base64url'),
    CLIENT_DIR: options.clientDir,
    // The local fake SMTP server on any free port, so the bench never meets another on 2525.
    FAKE_SMTP_PORT: '0',
    SMTP_URL: '',
    ...options.env,
  };
  const { child, stderr } = spawnBuiltServer(env);
  const base = `http://127.0.0.1:${options.port}`;
  try {
    await waitUntilUp(`${base}/api/health`, child, stderr, 120_000);
  } catch (error) {
    await stopChild(child);
    throw error;
  }
  return { base, pid: child.pid!, probe: () => readProbe(child), stop: () => stopChild(child) };
}

export interface SignedIn {
  cookie: string;
  csrfToken: string;
}

function cookieOf(res: Response, fallback: string): string {
  const set = res.headers.get('set-cookie');
  return set ? set.split(';')[0] : fallback;
}

/** Signs in over HTTP as a browser would: CSRF token first, then the login that regenerates the session. */
export async function signIn(base: string, email: string, password: string): Promise<SignedIn> {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  if (!csrf.ok) throw new Error(`GET /api/auth/csrf answered ${csrf.status}`);
  const csrfToken = ((await csrf.json()) as { token: string }).token;
  let cookie = cookieOf(csrf, '');
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`sign-in as ${email} answered ${login.status}: ${await login.text()}`);
  cookie = cookieOf(login, cookie);
  return { cookie, csrfToken };
}
