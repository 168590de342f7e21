import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { body, processEnv, seedProcess, signInOverHttp, startServerProcess } from '../../helpers/server-process';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-crash-'));
const port = 3800 + Math.floor(Math.random() * 90);
const base = `http://127.0.0.1:${port}`;
const env = processEnv(dir, port);
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

async function prepare() {
  const lead = await signInOverHttp(base, 'lead@larchmere.test');
  const booth = await body(await lead('/api/booths', { method: 'POST', body: JSON.stringify({ name: 'Crash booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 })  }));
  const session = await body(await lead('/api/spray-sessions', { method: 'POST', body: JSON.stringify({ boothId: booth.booth.id, start: '2027-03-01T07:00:00Z', end: '2027-03-01T16:00:00Z', sprayerId: 3 })  }));
  const job = (await body(await lead('/api/jobs?q=LJ-26-101'))).items[0];
  const parts = (await body(await lead(`/api/jobs/${job.id}/parts`))).items.map((p: { id: number }) => p.id);
  const productId = (await body(await lead('/api/products?q=PU Primer'))).items[0].id;
  return { sessionId: session.spraySession.id as number, parts: parts as number[], productId: productId as number };
}

describe('a crash in the middle of a burst of coat records', () => {
  it('keeps every coat that was answered 201, and the database stays sound', async () => {
    seedProcess(env);
    let server = await startServerProcess(env);
    const { sessionId, parts, productId } = await prepare();
    const sprayer = await signInOverHttp(base, 'sprayer@larchmere.test');
    const answered: number[] = [];
    const startedAt = Date.now();
    let sent = 0;
    const one = async (i: number) => {
      const coat = { spraySessionId: sessionId, partIds: [parts[i % parts.length]], productId, sprayedAt: new Date(startedAt - 3_600_000 + i * 1000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
      try {
        const res = await sprayer('/api/coats', { method: 'POST', body: JSON.stringify(coat) });
        if (res.status === 201) answered.push((await body(res)).coat.id);
      } catch {
        // The connection died with the process: this coat was never confirmed.
      }
    };
    // 1,000 records, 50 in flight at a time; SIGKILL once 300 have been answered.
    const workers = Array.from({ length: 50 }, async () => {
      while (sent < 1000) {
        const i = sent++;
        await one(i);
        if (answered.length >= 300 && server.exitCode === null && !server.killed) server.kill('SIGKILL');
      }
    });
    await Promise.all(workers);
    expect(answered.length).toBeGreaterThanOrEqual(300);
    expect(answered.length).toBeLessThan(1000);

    server = await startServerProcess(env);
    try {
      const lead = await signInOverHttp(base, 'lead@larchmere.test');
      const stored = new Set<number>();
      for (let page = 1; ; page++) {
        const list = await body(await lead(`/api/coats?spraySessionId=${sessionId}&pageSize=500&page=${page}`));
        for (const c of list.items) stored.add(c.id);
        if (list.items.length < 500) break;
      }
      expect(answered.filter((id) => !stored.has(id))).toEqual([]);
    } finally {
      server.kill('SIGTERM');
      await new Promise((r) => server.once('exit', r));
    }
    const db = new Database(env.DATABASE_PATH!, { readonly: true });
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    db.close();
  }, 120_000);
});
