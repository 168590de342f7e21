import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// Under vitest the entities load through Vite's transform; the real server runs under tsx, which
// emits no decorator metadata. Starting the real process catches entities that only work in tests.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-process-'));
const port = 3900 + Math.floor(Math.random() * 90);
let child: ChildProcess | undefined;

async function waitForHealth(url: string, deadline: number): Promise<Response> {
  for (;;) {
    try {
      return await fetch(url);
    } catch (error) {
      if (Date.now() > deadline) throw error;
      await new Promise((r) => setTimeout(r, 200));
    }
  }
}

afterAll(() => {
  child?.kill('SIGTERM');
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('the server process', () => {
  it('migrates an empty database, serves health and stops cleanly on SIGTERM', async () => {
    // Node with tsx loaded, as `npm run serve` runs it: the tsx wrapper kills a child that does not
    // acknowledge a relayed signal within 30 ms, which a loaded machine can miss.
    child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, TSX_TSCONFIG_PATH: 'tsconfig.server.json', PORT: String(port), DATABASE_PATH: path.join(dir, 'db.sqlite'), DATABASE_URL: '', LOG_LEVEL: 'silent', NODE_ENV: 'test' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout?.on('data', (d) => (output += d));
    child.stderr?.on('data', (d) => (output += d));
    const res = await waitForHealth(`http://127.0.0.1:${port}/api/health`, Date.now() + 25000).catch((error) => {
      throw new Error(`${String(error)}\nserver output:\n${output}`);
    });
    expect(await res.json()).toEqual({ ok: true });

    // A backup may be taken while the server runs; a restore onto its database is refused.
    const cli = (...args: string[]) => spawnSync('node_modules/.bin/tsx', ['--tsconfig', 'tsconfig.server.json', 'server/db/cli.ts', ...args], { env: { ...process.env, DATABASE_PATH: path.join(dir, 'db.sqlite'), DATABASE_URL: '', UPLOAD_DIR: path.join(dir, 'uploads') }, encoding: 'utf8' });
    const backup = cli('backup');
    expect(backup.status, backup.stderr).toBe(0);
    const folder = /to (\S+) \(readable/.exec(backup.stdout)?.[1] ?? '';
    const restore = cli('restore', folder);
    expect(restore.status).toBe(1);
    expect(restore.stderr).toMatch(/A Boothwright server \(process \d+.*Stop the server first.*Nothing was changed/);

    const exited = new Promise<number | null>((resolve) => child!.on('exit', resolve));
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(fs.existsSync(path.join(dir, 'db.sqlite.lock'))).toBe(false);
    expect(output).toContain(`http://localhost:${port}`);
  }, 60000);
});
