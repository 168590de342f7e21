import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { ResponseCache } from '../../../server/lib/response-cache';
import { cacheBoundMs, clockBoundMs } from '../../../server/registry/cached-answers';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { createSiteFixtures, type SiteFixtures } from '../security/site-fixtures';

const post = (who: SignedIn, url: string, body: object = {}) =>
  who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const patch = (who: SignedIn, url: string, body: object) =>
  who.agent.patch(url).set('x-csrf-token', who.csrf).send(body);
const week = '/api/spray-sessions?from=2027-04-05T00:00:00.000Z&to=2027-04-12T00:00:00.000Z';
const sha1 = (text: string) => `"${createHash('sha1').update(text).digest('base64url')}"`;

describe('the response cache on one instance', () => {
  const clock = {
    at: new Date('2027-04-05T08:00:00Z'),
    now() {
      return this.at;
    },
  };
  const later = (ms: number) => (clock.at = new Date(clock.at.getTime() + ms));
  let ctx: TestContext;
  let lead: SignedIn;
  let sprayer: SignedIn;
  let boothId: number;
  let sessionId: number;
  let primerId: number;

  beforeAll(async () => {
    ctx = await startTestApp({ clock });
    [lead, sprayer] = await Promise.all([signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer)]);
    primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
    boothId = (
      await post(lead, '/api/booths', {
        name: 'Cache booth',
        kind: 'cross-draft',
        volumeM3: 60,
        extractionM3PerH: 18000,
      }).expect(201)
    ).body.booth.id;
    sessionId = (
      await post(lead, '/api/spray-sessions', {
        boothId,
        start: '2027-04-05T08:00:00Z',
        end: '2027-04-05T12:00:00Z',
        sprayerId: 3,
      }).expect(201)
    ).body.spraySession.id;
  });
  afterAll(async () => ctx?.close());

  it('answers a cached read with a strong ETag of its body, and 304 when the caller holds it', async () => {
    const first = await lead.agent.get(week).set('Accept-Encoding', 'identity').expect(200);
    expect(first.headers['content-encoding']).toBeUndefined();
    expect(first.headers.etag).toBe(sha1(first.text));
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const again = await lead.agent.get(week).set('Accept-Encoding', 'identity').expect(200);
    expect(again.text).toBe(first.text);
    expect(again.headers.etag).toBe(first.headers.etag);
    const held = await lead.agent.get(week).set('If-None-Match', first.headers.etag).expect(304);
    expect(held.text).toBe('');
    await lead.agent.get(week).set('If-None-Match', '"something-else"').expect(200);
  });

  it('compresses a big answer for a client that accepts it (brotli, else gzip), once, each with its own strong ETag', async () => {
    // The ready board of the demo shop is well over the 1,400 bytes compression starts at.
    const plain = await lead.agent.get('/api/ready').set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text.length).toBeGreaterThan(1400);
    const zipped = await lead.agent.get('/api/ready').set('Accept-Encoding', 'gzip, deflate').expect(200);
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.headers.vary).toMatch(/Accept-Encoding/);
    // superagent unpacks it with Node's zlib, not our code: the bytes are the same JSON.
    expect(zipped.text).toBe(plain.text);
    expect(zipped.headers.etag).toBe(`${plain.headers.etag.slice(0, -1)}-gz"`);
    await lead.agent.get('/api/ready').set('Accept-Encoding', 'gzip').set('If-None-Match', zipped.headers.etag).expect(304);
    // A browser over HTTPS asks for brotli too, and gets it.
    const brotli = await lead.agent.get('/api/ready').set('Accept-Encoding', 'gzip, deflate, br').expect(200);
    expect(brotli.headers['content-encoding']).toBe('br');
    expect(brotli.text).toBe(plain.text);
    expect(brotli.headers.etag).toBe(`${plain.headers.etag.slice(0, -1)}-br"`);
    expect(Number(brotli.headers['content-length'])).toBeLessThan(Number(zipped.headers['content-length']));
    await lead.agent.get('/api/ready').set('Accept-Encoding', 'br').set('If-None-Match', brotli.headers.etag).expect(304);
    await lead.agent.get('/api/ready').set('Accept-Encoding', 'gzip, br;q=0').expect(200).expect('Content-Encoding', 'gzip');
    // Small answers go as they are.
    const small = await lead.agent.get('/api/auth/session').set('Accept-Encoding', 'gzip');
    expect(small.headers['content-encoding']).toBeUndefined();
  });

  it('works the board out once for screens that all ask again at the same moment after a change', async () => {
    await patch(lead, `/api/booths/${boothId}`, { name: 'Cache booth' }).expect(200);
    const workedOut = vi.spyOn(ResponseCache.prototype, 'workingOn');
    try {
      const screens = await Promise.all(Array.from({ length: 5 }, () => lead.agent.get('/api/ready').set('Accept-Encoding', 'identity').expect(200)));
      expect(workedOut).toHaveBeenCalledTimes(1);
      expect(new Set(screens.map((screen) => screen.headers.etag)).size).toBe(1);
    } finally {
      workedOut.mockRestore();
    }
  });

  it('answers 304 on a matching If-None-Match also when the answer was not in the cache', async () => {
    const first = await lead.agent.get('/api/ready').expect(200);
    // A write clears the cache; the next read is worked out afresh and is still the same body.
    await patch(lead, `/api/booths/${boothId}`, { name: 'Cache booth' }).expect(200);
    await lead.agent.get('/api/ready').set('If-None-Match', first.headers.etag).expect(304);
  });

  it('never serves an answer from before a write on this instance, whatever route wrote', async () => {
    const before = (await lead.agent.get(week).expect(200)).body.items.find((s: { id: number }) => s.id === sessionId);
    expect(before.boothName).toBe('Cache booth');
    // Renaming a booth publishes no live change of its own; the write still clears cached answers.
    await patch(lead, `/api/booths/${boothId}`, { name: 'Renamed cache booth' }).expect(200);
    const after = (await lead.agent.get(week).expect(200)).body.items.find((s: { id: number }) => s.id === sessionId);
    expect(after.boothName).toBe('Renamed cache booth');

    const coatsBefore = (await lead.agent.get(`/api/coats?spraySessionId=${sessionId}`).expect(200)).body.total;
    const job = (
      await post(lead, '/api/jobs', { customer: 'Cache Ltd', reference: 'CACHE-1', dueDate: '2027-04-09' }).expect(201)
    ).body.job;
    const part = (
      await post(lead, `/api/jobs/${job.id}/parts`, {
        label: 'Door',
        lengthMm: 700,
        widthMm: 400,
        thicknessMm: 18,
      }).expect(201)
    ).body.part;
    await post(sprayer, '/api/coats', {
      spraySessionId: sessionId,
      partIds: [part.id],
      productId: primerId,
      sprayedAt: clock.at.toISOString(),
      airTempC: 20,
      relativeHumidityPct: 50,
      surfaceTempC: 19,
    }).expect(201);
    expect((await lead.agent.get(`/api/coats?spraySessionId=${sessionId}`).expect(200)).body.total).toBe(
      coatsBefore + 1,
    );
  });

  it('moves a part on along the ready board as drying time passes, with no write in between', async () => {
    const door = async () =>
      (await lead.agent.get('/api/ready').expect(200)).body.items.find(
        (p: { label: string; jobReference: string }) => p.jobReference === 'CACHE-1',
      );
    const wet = await door();
    expect(wet.handleAt).not.toBeNull();
    const handleMs = Date.parse(wet.handleAt);
    clock.at = new Date(handleMs - 1);
    expect((await door()).state).toBe(wet.state);
    clock.at = new Date(handleMs);
    expect((await door()).state).not.toBe(wet.state);
  });

  it('keeps an answer from the cache only for its bound when something changes behind the app’s back', async () => {
    await lead.agent.get(week).expect(200);
    const byHand =
      ctx.database.config.kind === 'postgres'
        ? 'UPDATE spray_sessions SET notes = $1 WHERE id = $2'
        : 'UPDATE spray_sessions SET notes = ? WHERE id = ?';
    await ctx.dataSource.query(byHand, ['Changed by hand', sessionId]);
    const notesOf = async () =>
      (await lead.agent.get(week).expect(200)).body.items.find((s: { id: number }) => s.id === sessionId).notes;
    // The calendar's answer depends on the clock, so it is kept for clockBoundMs at most.
    expect(await notesOf()).not.toBe('Changed by hand');
    later(clockBoundMs);
    expect(await notesOf()).toBe('Changed by hand');
    expect(cacheBoundMs).toBeGreaterThan(clockBoundMs);
  });
});

describe('the response cache across roles and sites', () => {
  let ctx: TestContext;
  let fx: SiteFixtures;
  let firstLead: SignedIn;

  beforeAll(async () => {
    ctx = await startTestApp();
    fx = await createSiteFixtures(ctx.app);
    firstLead = await signIn(ctx.app, demo.lead);
  }, 60_000);
  afterAll(async () => ctx?.close());

  const sessionIds = async (who: SignedIn, url: string) =>
    ((await who.agent.get(url).expect(200)).body.items as { id: number }[]).map((s) => s.id);

  it('never gives a lead of one site the cached answer another site’s lead was given for the same address', async () => {
    const url = '/api/spray-sessions?from=2027-05-01T00:00:00.000Z&to=2027-08-01T00:00:00.000Z';
    const first = await sessionIds(firstLead, url);
    expect(first).toContain(fx.first.spraySessionId);
    const second = await sessionIds(fx.people.lead, url);
    expect(second).toContain(fx.second.spraySessionId);
    expect(second).not.toContain(fx.first.spraySessionId);
    // And the other way about, with the second site's answer now in the cache.
    expect(await sessionIds(firstLead, url)).not.toContain(fx.second.spraySessionId);
    const report = '/api/reports/booth-use?from=2027-05-01&to=2027-08-01';
    const firstReport = (await firstLead.agent.get(report).expect(200)).text;
    expect((await fx.people.lead.agent.get(report).expect(200)).text).not.toBe(firstReport);
  });

  it('still refuses a role the route does not allow after another role’s answer was cached', async () => {
    const report = '/api/reports/booth-use?from=2027-05-01&to=2027-08-01';
    await firstLead.agent.get(report).expect(200);
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await sprayer.agent.get(report).expect(403);
  });

  it('gives each role its own entry, and the admin across sites sees both', async () => {
    const url = '/api/coats?pageSize=200';
    const byLead = (await firstLead.agent.get(url).expect(200)).body.items.map((c: { id: number }) => c.id);
    const byAdmin = (await fx.admin.agent.get(url).expect(200)).body.items.map((c: { id: number }) => c.id);
    expect(byLead).not.toContain(fx.second.coatId);
    expect(byAdmin).toEqual(expect.arrayContaining([fx.first.coatId, fx.second.coatId]));
    expect((await firstLead.agent.get(url).expect(200)).body.items.map((c: { id: number }) => c.id)).not.toContain(
      fx.second.coatId,
    );
  });

  it('clears the other site’s cached answers when a write on one site can reach them', async () => {
    const url = '/api/coats?pageSize=200';
    await fx.people.lead.agent.get(url).expect(200);
    const coatId = await fx.secondSiteCoat();
    expect((await fx.people.lead.agent.get(url).expect(200)).body.items.map((c: { id: number }) => c.id)).toContain(
      coatId,
    );
  });
});
