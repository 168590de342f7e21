import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
let boothId: number;
// The server's clock: today, except while a filter change is logged as it happens (in 2019–2020).
const clock = { at: null as Date | null, now() { return this.at ?? new Date(); } };

const post = (url: string, body: object) => admin.agent.post(url).set('x-csrf-token', admin.csrf).send(body).expect(201);
type Row = { boothId: number | null; kind: string; done: number; due: number | null; doneByDue: number | null };

/**
 * A booth and a sprayer with a hand-made history in 2019–2021, years the demo shop (dated back
 * from today) never reaches. The report covers 2020, shop time (Europe/London).
 */
beforeAll(async () => {
  ctx = await startTestApp({ clock });
  admin = await signIn(ctx.app, demo.admin);
  boothId = (await post('/api/booths', { name: 'Report booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 })).body.booth.id;
  // T1 due 2020-03-10 (14 months on), superseded on time by T2 on 2020-03-01; T2 due 2020-09-01, renewed late by T3 on 2020-10-01 (due 2021-12-01, outside).
  await post('/api/extraction-tests', { boothId, testedOn: '2019-01-10', faceVelocityPointsMps: [0.5], testedBy: 'Fellgate' });
  await post('/api/extraction-tests', { boothId, testedOn: '2020-03-01', faceVelocityPointsMps: [0.5], testedBy: 'Fellgate', nextDueOn: '2020-09-01' });
  await post('/api/extraction-tests', { boothId, testedOn: '2020-10-01', faceVelocityPointsMps: [0.5], testedBy: 'Fellgate' });
  // One inspection in the range, due again in 2021.
  await post('/api/fire-inspections', { boothId, inspectedOn: '2020-01-31', inspectedBy: 'Keldmoor', passed: true });
  const bank = (await post('/api/filter-banks', { boothId, name: 'Pads', kind: 'paint-arrestor', changeAtPa: 250 })).body.filterBank.id;
  // 23:30 UTC on 31 December is still 31 December in London (GMT): the first is outside 2020, the last inside.
  for (const changedAt of ['2019-12-31T23:30:00Z', '2020-06-01T10:00:00Z', '2020-12-31T23:30:00Z']) {
    clock.at = new Date(changedAt);
    await post('/api/filter-changes', { filterBankId: bank, changedAt });
  }
  clock.at = null;
  const sprayer = (await post('/api/users', { email: 'report.sprayer@larchmere.test', name: 'Report Sprayer', role: 'sprayer', password: 'matrix-password-1' })).body.user.id;
  // Fit test due 2020-02-01, renewed on 2020-01-20: on time. Training due 2020-05-01, never renewed.
  await post(`/api/crew/${sprayer}/records`, { kind: 'fit-test', doneOn: '2019-02-01', respiratorModel: 'Ostrel HM-200, M', result: 'pass' });
  await post(`/api/crew/${sprayer}/records`, { kind: 'fit-test', doneOn: '2020-01-20', respiratorModel: 'Ostrel HM-200, M', result: 'pass' });
  await post(`/api/crew/${sprayer}/records`, { kind: 'training', doneOn: '2019-05-01', title: 'Spray gun set-up', nextDueOn: '2020-05-01' });
});
afterAll(async () => ctx.close());

describe('GET /api/reports/upkeep', () => {
  it('counts upkeep done and due in the range per booth, and how much was done again by its due date', async () => {
    const res = await admin.agent.get('/api/reports/upkeep?from=2020-01-01&to=2020-12-31').expect(200);
    const rows: Row[] = res.body.report.rows;
    const of = (kind: string) => rows.find((r) => r.boothId === boothId && r.kind === kind);
    // Worked by hand from the history above.
    expect(of('extraction-test')).toMatchObject({ done: 2, due: 2, doneByDue: 1 });
    expect(of('fire-inspection')).toMatchObject({ done: 1, due: 0, doneByDue: 0 });
    expect(of('filter-change')).toMatchObject({ done: 2, due: null, doneByDue: null });
  });

  it('gives the crew as counts only: done, due and renewed on time', async () => {
    const res = await admin.agent.get('/api/reports/upkeep?from=2020-01-01&to=2020-12-31').expect(200);
    const crew = (kind: string) => res.body.report.rows.find((r: Row) => r.boothId === null && r.kind === kind);
    expect(crew('fit-test')).toMatchObject({ done: 1, due: 1, doneByDue: 1 });
    expect(crew('training')).toMatchObject({ done: 0, due: 1, doneByDue: 0 });
    expect(crew('health-surveillance')).toMatchObject({ done: 0, due: 0, doneByDue: 0 });
    expect(JSON.stringify(res.body)).not.toContain('Report Sprayer');
  });

  it('answers the same table as CSV, and refuses a sprayer', async () => {
    const csv = await admin.agent.get('/api/reports/upkeep?from=2020-01-01&to=2020-12-31&format=csv').expect(200);
    expect(csv.headers['content-type']).toContain('text/csv');
    expect(csv.text).toContain('Report booth,extraction-test,2,2,1');
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await sprayer.agent.get('/api/reports/upkeep?from=2020-01-01&to=2020-12-31').expect(403);
  });
});
