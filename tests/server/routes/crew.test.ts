import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addCalendarMonths } from '../../../shared/finishing/upkeep-due';
import { calendarDateIn } from '../../../shared/time';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let sprayer: SignedIn;
let assembler: SignedIn;
let minaId: number;
let devId: number;

const today = () => calendarDateIn(new Date(), 'Europe/London');
const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const idOf = async (who: SignedIn) => (await who.agent.get('/api/auth/me').expect(200)).body.user.id as number;

beforeAll(async () => {
  ctx = await startTestApp();
  [admin, lead, sprayer, assembler] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
  [minaId, devId] = await Promise.all([idOf(sprayer), idOf(lead)]);
});
afterAll(async () => ctx.close());

describe('POST /api/crew/:userId/records', () => {
  it('lets the admin record a fit test, due again after the shop’s 12 months', async () => {
    const doneOn = today();
    const res = await post(admin, `/api/crew/${minaId}/records`, { kind: 'fit-test', doneOn, respiratorModel: 'Ostrel HM-200 half mask, size M', result: 'pass' }).expect(201);
    // Yearly fit tests: common practice, no published source.
    expect(res.body.record).toMatchObject({ kind: 'fit-test', userId: minaId, respiratorModel: 'Ostrel HM-200 half mask, size M', result: 'pass', nextDueOn: addCalendarMonths(doneOn, 12), recordedByName: 'Ros Halloran' });
  });

  it('asks for what each kind needs, field by field, and refuses a date to come', async () => {
    const noModel = await post(admin, `/api/crew/${minaId}/records`, { kind: 'fit-test', doneOn: '2025-01-10', result: 'pass' }).expect(400);
    expect(noModel.body.error.fields).toHaveProperty('respiratorModel');
    const noTitle = await post(admin, `/api/crew/${minaId}/records`, { kind: 'training', doneOn: '2025-01-10' }).expect(400);
    expect(noTitle.body.error.fields).toHaveProperty('title');
    const ahead = await post(admin, `/api/crew/${minaId}/records`, { kind: 'health-surveillance', doneOn: addCalendarMonths(today(), 2) }).expect(400);
    expect(ahead.body.error.fields).toHaveProperty('doneOn');
    await post(admin, `/api/crew/${minaId}/records`, { kind: 'x-ray', doneOn: '2025-01-10' }).expect(400);
    await post(admin, '/api/crew/99999/records', { kind: 'health-surveillance', doneOn: '2025-01-10' }).expect(404);
  });

  it('is the admin’s alone: a lead and a sprayer are refused', async () => {
    await post(lead, `/api/crew/${minaId}/records`, { kind: 'health-surveillance', doneOn: '2025-01-10' }).expect(403);
    await post(sprayer, `/api/crew/${minaId}/records`, { kind: 'health-surveillance', doneOn: '2025-01-10' }).expect(403);
  });
});

describe('who sees what', () => {
  it('shows the person themself every detail of their own records', async () => {
    const res = await sprayer.agent.get(`/api/crew/${minaId}`).expect(200);
    const fitTests = res.body.crew.records.filter((r: { kind: string }) => r.kind === 'fit-test');
    expect(fitTests.length).toBeGreaterThanOrEqual(2);
    expect(fitTests[0]).toMatchObject({ respiratorModel: expect.stringContaining('Ostrel'), result: 'pass', nextDueOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/) });
    expect(res.body.crew.status).toMatchObject({ fitTest: 'valid', healthSurveillance: 'valid', training: 'valid' });
  });

  it('refuses a sprayer another person’s records, and a lead anyone’s details but their own', async () => {
    await sprayer.agent.get(`/api/crew/${devId}`).expect(403);
    await lead.agent.get(`/api/crew/${minaId}`).expect(403);
    await lead.agent.get(`/api/crew/${devId}`).expect(200);
    await assembler.agent.get(`/api/crew/${minaId}`).expect(403);
    await admin.agent.get(`/api/crew/${minaId}`).expect(200);
  });

  it('gives a lead the crew list as statuses only: no dates, models, results or notes', async () => {
    const res = await lead.agent.get('/api/crew').expect(200);
    const mina = res.body.items.find((p: { userId: number }) => p.userId === minaId);
    expect(Object.keys(mina).sort()).toEqual(['fitTest', 'healthSurveillance', 'name', 'role', 'siteId', 'training', 'userId']);
    expect(mina).toMatchObject({ fitTest: 'valid', healthSurveillance: 'valid' });
    const text = JSON.stringify(res.body);
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}|Ostrel|pass|spirometry/i);
    await sprayer.agent.get('/api/crew').expect(403);
  });

  it('counts a failed fit test as lapsed in the status', async () => {
    const pellId = (await post(admin, '/api/users', { email: 'spare.sprayer@larchmere.test', name: 'Pell Armitage', role: 'sprayer', password: 'matrix-password-1' }).expect(201)).body.user.id;
    await post(admin, `/api/crew/${pellId}/records`, { kind: 'fit-test', doneOn: today(), respiratorModel: 'Ostrel HM-200 half mask, size S', result: 'fail' }).expect(201);
    const res = await lead.agent.get('/api/crew').expect(200);
    expect(res.body.items.find((p: { userId: number }) => p.userId === pellId)).toMatchObject({ fitTest: 'lapsed', healthSurveillance: 'none', training: 'none' });
  });
});
