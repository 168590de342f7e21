// Starts the built app (`npm run build`: dist-server/ and the client) for the browser tests, as
// `npm run serve` does, on a fresh SQLite file with the demo shop seeded by the built CLI.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

if (!fs.existsSync('dist-server/index.js')) {
  console.error('No built server in dist-server/: run `npm run build` first.');
  process.exit(1);
}

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-e2e-'));
const env = {
  ...process.env,
  NODE_ENV: 'production',
  PORT: process.env.E2E_PORT ?? '3100',
  DATABASE_PATH: path.join(dir, 'e2e.sqlite'),
  DATABASE_URL: '',
  UPLOAD_DIR: path.join(dir, 'uploads'),
  LOG_LEVEL: 'warn',
};

const seeded = spawnSync(process.execPath, ['dist-server/cli.js', 'seed'], { env, stdio: 'inherit' });
if (seeded.status !== 0) process.exit(seeded.status ?? 1);

const server = spawn(process.execPath, ['--max-old-space-size=256', '--max-semi-space-size=4', 'dist-server/index.js'], { env: { MALLOC_ARENA_MAX: '2', ...env }, stdio: 'inherit' });
const stop = () => {
  server.kill('SIGTERM');
  fs.rmSync(dir, { recursive: true, force: true });
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
server.on('exit', (code) => process.exit(code ?? 0));
