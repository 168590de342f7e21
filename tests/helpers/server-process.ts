import { spawn, spawnSync, type ChildProcess } from 'node:child_process';

const tsx = ['node_modules/.bin/tsx', '--tsconfig', 'tsconfig.server.json'] as const;

/** A response body as the test expects it to be; the assertions that follow check it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export const body = async (res: Response): Promise<any> => res.json();

export function processEnv(dir: string, port: number): NodeJS.ProcessEnv {
  return { ...process.env, PORT: String(port), DATABASE_PATH: `${dir}/db.sqlite`, UPLOAD_DIR: `${dir}/uploads`, DATABASE_URL: '', LOG_LEVEL: 'silent', NODE_ENV: 'test', FAKE_SMTP_PORT: '0' };
}

export function seedProcess(env: NodeJS.ProcessEnv): void {
  const result = spawnSync(tsx[0], [...tsx.slice(1), 'server/db/cli.ts', 'seed'], { env, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`seed failed: ${result.stderr}`);
}

/** Starts server/index.ts as its own process and waits until it answers health; `onOutput` hears its stdout and stderr. */
export async function startServerProcess(env: NodeJS.ProcessEnv, onOutput?: (text: string) => void): Promise<ChildProcess> {
  // Node itself with tsx loaded (not the tsx wrapper), so a SIGKILL reaches the server, not a parent.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { env: { ...env, TSX_TSCONFIG_PATH: 'tsconfig.server.json' }, stdio: onOutput ? ['ignore', 'pipe', 'pipe'] : 'ignore' });
  child.stdout?.on('data', (chunk: Buffer) => onOutput?.(chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => onOutput?.(chunk.toString()));
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      if ((await fetch(`http://127.0.0.1:${env.PORT}/api/health`)).ok) return child;
    } catch {
      if (Date.now() > deadline) {
        child.kill('SIGKILL');
        throw new Error('server did not start');
      }
      await new Promise((r) => setTimeout(r, 200));
    }
  }
}

/** A tiny cookie-keeping client signed in as one user, for tests that talk to a real process. */
export async function signInOverHttp(base: string, email: string, password = 'finish-demo-2026') {
  let cookie = '';
  const keep = (res: Response) => {
    const set = res.headers.get('set-cookie');
    if (set) cookie = set.split(';')[0];
    return res;
  };
  const token = (await body(keep(await fetch(`${base}/api/auth/csrf`)))).token as string;
  const call = (path: string, init: RequestInit = {}) =>
    fetch(`${base}${path}`, { ...init, headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie, ...(init.headers ?? {}) } }).then(keep);
  const login = await call('/api/auth/login', { method: 'POST', body: JSON.stringify({ email, password }) });
  if (!login.ok) throw new Error(`sign-in failed: ${login.status}`);
  return call;
}
