// Starts the built app for the browser tests on a fresh SQLite file with the demo shop seeded.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

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
const tsx = ['node_modules/.bin/tsx', '--tsconfig', 'tsconfig.server.json'];

const seeded = spawnSync(tsx[0], [...tsx.slice(1), 'server/db/cli.ts', 'seed'], { env, stdio: 'inherit' });
if (seeded.status !== 0) process.exit(seeded.status ?? 1);

const server = spawn(tsx[0], [...tsx.slice(1), 'server/index.ts'], { env, stdio: 'inherit' });
const stop = () => {
  server.kill('SIGTERM');
  fs.rmSync(dir, { recursive: true, force: true });
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
server.on('exit', (code) => process.exit(code ?? 0));
