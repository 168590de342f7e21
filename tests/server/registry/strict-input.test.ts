import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let jobId: number;

beforeAll(async () => {
  ctx = await startTestApp();
  lead = await signIn(ctx.app, demo.lead);
  jobId = (await lead.agent.get('/api/jobs?pageSize=1').expect(200)).body.items[0].id;
});
afterAll(async () => ctx.close());

describe('ids in the path', () => {
  it('reads a plain decimal id', async () => {
    await lead.agent.get(`/api/jobs/${jobId}`).expect(200);
  });

  it.each(['0x10', '1e1', '016', '+7', '7.0', '0', '-3', '2147483648', '٣'])('answers 400 with a field message for /api/jobs/%s', async (id) => {
    const res = await lead.agent.get(`/api/jobs/${encodeURIComponent(id)}`).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields.id).toBeTruthy();
  });
});

describe('query parameters', () => {
  it('answers 400 naming a nested key instead of ignoring it', async () => {
    const res = await lead.agent.get('/api/spray-sessions?boothId[a]=1').expect(400);
    expect(res.body.error.fields).toEqual({ 'boothId[a]': expect.stringContaining('boothId') });
  });

  it('answers 400 naming an unknown key', async () => {
    const res = await lead.agent.get('/api/coats?sprayedBy=4').expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['sprayedBy']);
  });

  it('answers 400 for a route that takes no query at all', async () => {
    const res = await lead.agent.get('/api/settings?x=1').expect(400);
    expect(res.body.error.fields.x).toMatch(/no parameters/);
  });

  it('answers 400 for a repeated key and for ids or numbers not in plain digits', async () => {
    expect((await lead.agent.get('/api/coats?page=1&page=2').expect(400)).body.error.fields.page).toBeTruthy();
    expect((await lead.agent.get('/api/coats?jobId=0x10').expect(400)).body.error.fields.jobId).toBeTruthy();
    expect((await lead.agent.get('/api/jobs?pageSize=1e2').expect(400)).body.error.fields.pageSize).toBeTruthy();
    expect((await lead.agent.get(`/api/jobs/${jobId}/estimate?transferEfficiencyPct=0x41`).expect(400)).body.error.fields.transferEfficiencyPct).toBeTruthy();
  });

  it('still takes what the routes declare', async () => {
    await lead.agent.get(`/api/coats?jobId=${jobId}&history=true&page=1&pageSize=20`).expect(200);
    await lead.agent.get(`/api/jobs/${jobId}/estimate?method=airless&transferEfficiencyPct=62.5`).expect(200);
    await lead.agent.get('/api/booths?page=1&pageSize=200&siteId=1').expect(200);
  });
});
