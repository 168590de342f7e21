import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { readySummaryResponseSchema, type ReadySummary } from '../../../shared/schemas/ready';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const password = 'second-site-pass-2026';

describe('GET /api/ready/summary', () => {
  const clock = {
    at: new Date('2027-04-05T08:00:00Z'),
    now() {
      return this.at;
    },
  };
  let ctx: TestContext;
  let admin: SignedIn;
  let lead: SignedIn;
  let assembler: SignedIn;
  let otherLead: SignedIn;
  let otherSiteId: number;
  let partId: number;
  let handleAt: string;

  const summaryOf = async (who: SignedIn, query = ''): Promise<ReadySummary> =>
    readySummaryResponseSchema.parse((await who.agent.get(`/api/ready/summary${query}`).expect(200)).body).summary;
  const wallJob = (summary: ReadySummary) => summary.jobs.find((job) => job.jobReference === 'WALL-1');

  beforeAll(async () => {
    ctx = await startTestApp({ clock });
    [admin, lead, assembler] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.assembler)]);
    const sprayer = await signIn(ctx.app, demo.sprayer);
    const primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
    const booth = { name: 'Wall booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 };
    const boothId = (await post(lead, '/api/booths', booth).expect(201)).body.booth.id;
    const slot = { boothId, start: '2027-04-05T08:00:00Z', end: '2027-04-05T12:00:00Z', sprayerId: 3 };
    const sessionId = (await post(lead, '/api/spray-sessions', slot).expect(201)).body.spraySession.id;
    const job = (await post(lead, '/api/jobs', { customer: 'Wall Ltd', reference: 'WALL-1', dueDate: '2027-04-09' }).expect(201)).body.job;
    const part = { label: 'Wall door', lengthMm: 700, widthMm: 400, thicknessMm: 18, rackId: 1, shelf: 2 };
    partId = (await post(lead, `/api/jobs/${job.id}/parts`, part).expect(201)).body.part.id;
    const coat = { spraySessionId: sessionId, partIds: [partId], productId: primerId, sprayedAt: clock.at.toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
    await post(sprayer, '/api/coats', coat).expect(201);
    handleAt = (await lead.agent.get('/api/ready?jobId=' + job.id).expect(200)).body.items[0].handleAt;
    otherSiteId = (await post(admin, '/api/sites', { name: 'Wall second site' }).expect(201)).body.site.id;
    await post(admin, '/api/users', { email: 'lead.wall@larchmere.test', name: 'Wall lead', role: 'lead', password, siteId: otherSiteId }).expect(201);
    otherLead = await signIn(ctx.app, 'lead.wall@larchmere.test', password);
  });
  afterAll(async () => ctx?.close());

  it('counts a job’s parts per state, names the next part to be ready and when a count changes next', async () => {
    const summary = await summaryOf(assembler);
    const job = wallJob(summary);
    expect(job).toMatchObject({ customer: 'Wall Ltd', counts: { drying: 1 }, partsLeft: 1, nextChangeAt: handleAt });
    expect(summary.nextReady.find((p) => p.id === partId)).toEqual({ id: partId, label: 'Wall door', jobReference: 'WALL-1', handleAt, rack: { id: 1, name: expect.any(String), shelf: 2 } });
    expect(summary.totals.drying).toBeGreaterThanOrEqual(1);
    expect(summary.jobsInFinish).toBeGreaterThanOrEqual(summary.jobs.length);
    expect(Date.parse(summary.nextChangeAt!)).toBeLessThanOrEqual(Date.parse(handleAt));
    expect(summary.asOf).toBe(clock.at.toISOString());
  });

  it('is a few KB where the whole board is far more', async () => {
    const board = await lead.agent.get('/api/ready').set('Accept-Encoding', 'identity').expect(200);
    const brief = await lead.agent.get('/api/ready/summary').set('Accept-Encoding', 'identity').expect(200);
    expect(brief.text.length).toBeLessThan(8_000);
    expect(brief.text.length).toBeLessThan(board.text.length / 2);
  });

  it('moves the part from drying to ready to handle as its handle time passes, with no write in between', async () => {
    clock.at = new Date(Date.parse(handleAt) - 1);
    expect(wallJob(await summaryOf(assembler))?.counts).toEqual({ drying: 1 });
    clock.at = new Date(handleAt);
    const summary = await summaryOf(assembler);
    expect(wallJob(summary)?.counts).toEqual({ 'ready-to-handle': 1 });
    expect(summary.nextReady.map((p) => p.id)).not.toContain(partId);
  });

  it('shows a lead of another site none of this site’s parts, and an admin only the site asked for', async () => {
    expect(wallJob(await summaryOf(lead))).toBeDefined();
    const other = await summaryOf(otherLead);
    expect(wallJob(other)).toBeUndefined();
    expect(other.nextReady.map((p) => p.id)).not.toContain(partId);
    // A non-admin's ?siteId= cannot reach past their own site.
    expect(wallJob(await summaryOf(otherLead, '?siteId=1'))).toBeUndefined();
    expect(wallJob(await summaryOf(admin, `?siteId=${otherSiteId}`))).toBeUndefined();
    expect(wallJob(await summaryOf(admin, '?siteId=1'))).toBeDefined();
  });

  it('sends as many cards and parts as asked, and refuses a bad count with the field named', async () => {
    const one = await summaryOf(lead, '?jobs=1&next=1');
    expect(one.jobs.length).toBeLessThanOrEqual(1);
    expect(one.nextReady.length).toBeLessThanOrEqual(1);
    const bad = await lead.agent.get('/api/ready/summary?jobs=0&next=1e3').expect(400);
    expect(bad.body.error.code).toBe('validation_failed');
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['jobs', 'next']);
    const unknown = await lead.agent.get('/api/ready/summary?state=drying').expect(400);
    expect(Object.keys(unknown.body.error.fields)).toEqual(['state']);
  });

  it('is refused to anyone not signed in', async () => {
    await request(ctx.app).get('/api/ready/summary').expect(401);
  });
});
