import fs from 'node:fs';
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simplePdf } from '../../server/db/demo-pdf';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { startFakeS3, type FakeS3 } from '../helpers/fake-s3';
import { body } from '../helpers/server-process';
import { createTestDatabase, type TestDatabase } from '../helpers/test-database';
import { call, instanceEnv, openEventStream, seedAsync, signInAt, startInstance, stopInstance, waitUntil, type Instance, type Session } from './cluster';

// Two real server processes on one PostgreSQL database, as behind a load balancer. Needs
// TEST_DATABASE_URL (a role that may CREATEDB); `.ci/run` sets it. Without it this file skips.
const pgUrl = process.env.TEST_DATABASE_URL;
const ports = { a: 3500, b: 3501, s3: 3502 };

let database: TestDatabase;
let s3: FakeS3;
let mail: FakeSmtp;
let a: Instance;
let b: Instance;
let leadOnA: Session;
let envA: NodeJS.ProcessEnv;

const json = async (res: Response) => ({ status: res.status, body: await body(res) });

async function newBooth(name: string): Promise<number> {
  const res = await json(await call(a.base, leadOnA, '/api/booths', { method: 'POST', body: { name, kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 } }));
  expect(res.status).toBe(201);
  return res.body.booth.id;
}

async function bookFor(instance: Instance, boothId: number, start: string, end: string, sprayerId: number | null = null): Promise<Response> {
  return call(instance.base, leadOnA, '/api/spray-sessions', { method: 'POST', body: { boothId, start, end, sprayerId } });
}

describe.skipIf(!pgUrl)('two app instances on one PostgreSQL database (skipped without TEST_DATABASE_URL)', () => {
  beforeAll(async () => {
    database = await createTestDatabase();
    if (database.config.kind !== 'postgres') throw new Error('TEST_DATABASE_URL must name a PostgreSQL database');
    s3 = await startFakeS3(ports.s3);
    mail = await startFakeSmtp(0);
    // Every tick each second, so the test need not wait for whole minutes.
    const shared = { ...s3.env, DATABASE_URL: database.config.url, SESSION_SECRET: 'shared-secret-for-the-two-instances', SMTP_URL: `smtp://127.0.0.1:${mail.port}`, NOTIFICATION_SCHEDULE: '* * * * * *' };
    envA = instanceEnv(ports.a, shared);
    await seedAsync(envA);
    [a, b] = await Promise.all([startInstance('A', envA), startInstance('B', instanceEnv(ports.b, shared))]);
    leadOnA = await signInAt(a.base, 'lead@larchmere.test');
  }, 90_000);

  afterAll(async () => {
    await Promise.all([stopInstance(a), stopInstance(b)]);
    await Promise.all([s3?.stop(), mail?.close(), database?.drop()]);
  }, 30_000);

  it('keeps a sign-in made on one instance valid on the other', async () => {
    const me = await json(await call(b.base, leadOnA, '/api/auth/me'));
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('lead@larchmere.test');
  });

  it('ends a sign-in on the other instance at once when it signs out or its user changes on one', async () => {
    const sprayer = await signInAt(a.base, 'sprayer@larchmere.test');
    expect((await call(b.base, sprayer, '/api/auth/me')).status).toBe(200);
    expect((await call(a.base, sprayer, '/api/auth/logout', { method: 'POST', body: {} })).status).toBe(204);
    // Each instance holds sign-ins for a few seconds; the shared change feed clears them.
    await waitUntil('instance B forgets the ended sign-in', async () => (await call(b.base, sprayer, '/api/auth/me')).status === 401, 2000);
    const assembler = await signInAt(a.base, 'assembler@larchmere.test');
    const before = await json(await call(b.base, assembler, '/api/auth/me'));
    expect(before.body.user.units).toBe('metric');
    expect((await call(a.base, assembler, '/api/auth/me', { method: 'PATCH', body: { units: 'us' } })).status).toBe(200);
    await waitUntil('instance B sees the changed user', async () => (await json(await call(b.base, assembler, '/api/auth/me'))).body.user.units === 'us', 2000);
  });

  it('lets exactly one of several bookings of one slot, sent to both instances at once, succeed', async () => {
    const boothId = await newBooth('Race booth');
    for (const day of ['05', '06', '07', '08']) {
      const start = `2027-04-${day}T08:00:00Z`;
      const end = `2027-04-${day}T10:00:00Z`;
      const racers = [a, b, a, b, a, b].map((instance) => bookFor(instance, boothId, start, end));
      const statuses = (await Promise.all(racers)).map((r) => r.status);
      expect(statuses.filter((s) => s === 201)).toHaveLength(1);
      expect(statuses.filter((s) => s === 409)).toHaveLength(5);
    }
  });

  it('never serves a cached answer on one instance from before a write on the other', async () => {
    const boothId = await newBooth('Cached booth');
    const week = '/api/spray-sessions?from=2027-05-03T00:00:00.000Z&to=2027-05-10T00:00:00.000Z';
    const first = await json(await bookFor(a, boothId, '2027-05-04T08:00:00Z', '2027-05-04T10:00:00Z'));
    const listedOn = async (instance: Instance) => (await json(await call(instance.base, leadOnA, week))).body.items as { id: number; boothName: string }[];
    // Asked twice on B, so the second answer comes from B's cache.
    await listedOn(b);
    expect((await listedOn(b)).find((s) => s.id === first.body.spraySession.id)?.boothName).toBe('Cached booth');
    // A strong ETag is the body's hash: both instances name the same answer alike, and B answers 304 to A's.
    const onA = await call(a.base, leadOnA, week);
    await onA.text();
    // As a browser revalidates from its own cache (fetch() would add `no-cache` to a hand-set If-None-Match).
    const revalidate = { 'If-None-Match': onA.headers.get('etag')!, 'Cache-Control': 'max-age=0' };
    expect((await call(b.base, leadOnA, week, { headers: revalidate })).status).toBe(304);

    const second = await json(await bookFor(a, boothId, '2027-05-05T08:00:00Z', '2027-05-05T10:00:00Z'));
    await waitUntil('B to list the session booked on A', async () => (await listedOn(b)).some((s) => s.id === second.body.spraySession.id), 2000);
    // Renaming a booth publishes no live change for the boards; it still clears B's cached answers.
    expect((await call(a.base, leadOnA, `/api/booths/${boothId}`, { method: 'PATCH', body: { name: 'Renamed cached booth' } })).status).toBe(200);
    await waitUntil('B to show the booth renamed on A', async () => (await listedOn(b)).every((s) => s.id !== first.body.spraySession.id || s.boothName === 'Renamed cached booth'), 2000);
  });

  it('brings a coat logged on one instance to a live board open on the other', async () => {
    const boothId = await newBooth('Live booth');
    const session = await json(await bookFor(a, boothId, '2027-03-01T09:00:00Z', '2027-03-01T12:00:00Z', 3));
    const job = (await json(await call(a.base, leadOnA, '/api/jobs?q=LJ-26-105'))).body.items[0];
    const partIds = (await json(await call(a.base, leadOnA, `/api/jobs/${job.id}/parts`))).body.items.slice(0, 2).map((p: { id: number }) => p.id);
    const productId = (await json(await call(a.base, leadOnA, '/api/products?q=PU%20Primer'))).body.items[0].id;
    const board = await openEventStream(b.base, leadOnA);
    try {
      await waitUntil('the event stream on B to open', () => board.received().includes('retry:'));
      const coatBody = { spraySessionId: session.body.spraySession.id, partIds, productId, sprayedAt: new Date(Date.now() - 3_600_000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
      const coat = await json(await call(a.base, leadOnA, '/api/coats', { method: 'POST', body: coatBody }));
      expect(coat.status).toBe(201);
      const expected = `"type":"coat.created","id":${coat.body.coat.id}`;
      await waitUntil('B to stream the coat logged on A', () => board.received().includes(expected));
    } finally {
      board.close();
    }
  });

  it('serves a file uploaded through one instance from the other, out of the shared bucket', async () => {
    const pdf = simplePdf('Shared data sheet', ['Uploaded through instance A']);
    const form = new FormData();
    form.append('kind', 'sds');
    form.append('file', new Blob([pdf], { type: 'application/pdf' }), 'shared-sheet.pdf');
    const uploaded = await json(await call(a.base, leadOnA, '/api/products/1/documents', { method: 'POST', body: form }));
    expect(uploaded.status).toBe(201);
    const download = await call(b.base, leadOnA, `/api/files/${uploaded.body.product.sdsFile.id}`);
    expect(download.status).toBe(200);
    expect(Buffer.from(await download.arrayBuffer()).equals(pdf)).toBe(true);
    // The bytes are in the bucket, not in either instance's upload folder.
    expect(await bucketHolds(pdf)).toBe(true);
    expect(fs.existsSync(envA.UPLOAD_DIR!)).toBe(false);
  });

  it('sends each due notification once although both instances run the scheduler', async () => {
    const boothId = await newBooth('Mail booth');
    const booked: number[] = [];
    for (const day of ['12', '13', '14', '15', '16']) {
      const res = await json(await bookFor(day === '14' ? b : a, boothId, `2027-04-${day}T07:00:00Z`, `2027-04-${day}T09:00:00Z`, 3));
      expect(res.status).toBe(201);
      booked.push(res.body.spraySession.id);
    }
    // The e-mail names the booth and shop time; its link is what tells one session's e-mail from another's.
    const mailsAbout = (id: number) => mail.messages.filter((m) => aboutSession(m.text, id) && m.text.includes('is booked or moved')).length;
    await waitUntil('the booking e-mails to arrive', () => booked.every((id) => mailsAbout(id) > 0), 20_000);
    // A tick that was already running may still be sending; two more finished ticks on each
    // instance mean every tick that could have seen these notifications owed is over.
    const seen = { a: a.ticks(), b: b.ticks() };
    await waitUntil('both instances to tick twice more', () => a.ticks() >= seen.a + 2 && b.ticks() >= seen.b + 2, 20_000);
    expect(booked.map(mailsAbout)).toEqual(booked.map(() => 1));
  });

  it('still sends when the instance that was sending dies', async () => {
    await stopInstance(a, 'SIGKILL');
    const sprayerId = 3;
    const boothId = (await json(await call(b.base, leadOnA, '/api/booths', { method: 'POST', body: { name: 'After A', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 } }))).body.booth.id;
    const res = await json(await bookFor(b, boothId, '2027-04-20T07:00:00Z', '2027-04-20T09:00:00Z', sprayerId));
    expect(res.status).toBe(201);
    await waitUntil('B to send the booking e-mail alone', () => mail.messages.some((m) => aboutSession(m.text, res.body.spraySession.id)), 20_000);
  });
});

/** Whether an e-mail links to this spray session's page (not one whose number starts the same). */
function aboutSession(text: string, id: number): boolean {
  return new RegExp(`/spray-sessions/${id}(?!\\d)`).test(text);
}

async function bucketHolds(bytes: Buffer): Promise<boolean> {
  const client = new S3Client({
    endpoint: s3.env.S3_ENDPOINT,
    region: s3.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: s3.env.S3_ACCESS_KEY_ID, secretAccessKey: s3.env.S3_SECRET_ACCESS_KEY },
  });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.env.S3_BUCKET }));
  for (const object of listed.Contents ?? []) {
    const stored = await client.send(new GetObjectCommand({ Bucket: s3.env.S3_BUCKET, Key: object.Key }));
    if (Buffer.from(await stored.Body!.transformToByteArray()).equals(bytes)) return true;
  }
  return false;
}
