import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addCalendarMonths } from '../../../shared/finishing/upkeep-due';
import { calendarDateIn } from '../../../shared/time';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let sprayer: SignedIn;
let assembler: SignedIn;

const today = () => calendarDateIn(new Date(), 'Europe/London');
const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const upkeepOf = async (boothId: number) => (await lead.agent.get(`/api/booths/${boothId}/upkeep`).expect(200)).body.upkeep;

beforeAll(async () => {
  ctx = await startTestApp();
  [admin, lead, sprayer, assembler] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
});
afterAll(async () => ctx.close());

describe('filter banks and gauge readings', () => {
  let bankId: number;

  it('lets a lead add a bank with its change-at pressure drop, and refuses a sprayer and a bad limit', async () => {
    const res = await post(lead, '/api/filter-banks', { boothId: 2, name: 'Exhaust pockets', kind: 'exhaust', changeAtPa: 300 }).expect(201);
    expect(res.body.filterBank).toMatchObject({ boothId: 2, name: 'Exhaust pockets', changeAtPa: 300, active: true, status: 'no-reading', currentPa: null });
    bankId = res.body.filterBank.id;
    await post(sprayer, '/api/filter-banks', { boothId: 2, name: 'Mine', kind: 'exhaust', changeAtPa: 300 }).expect(403);
    const bad = await post(lead, '/api/filter-banks', { boothId: 2, name: 'Too low', kind: 'exhaust', changeAtPa: 2 }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('changeAtPa');
    const noBooth = await post(lead, '/api/filter-banks', { boothId: 999, name: 'Nowhere', kind: 'exhaust', changeAtPa: 300 }).expect(400);
    expect(noBooth.body.error.fields).toHaveProperty('boothId');
  });

  it('takes a sprayer’s gauge reading and says near the limit from 80 % of it, change now at it', async () => {
    // 80 % of the maker's figure: common practice, no published source. 240 of 300 Pa is 80 %.
    const reading = await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bankId, pressureDropPa: 240 }).expect(201);
    expect(reading.body.reading).toMatchObject({ filterBankId: bankId, boothId: 2, pressureDropPa: 240, source: 'typed', recordedByName: 'Mina Castell' });
    expect((await upkeepOf(2)).banks.find((b: { id: number }) => b.id === bankId)).toMatchObject({ status: 'near-limit', currentPa: 240 });
    await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bankId, pressureDropPa: 305 }).expect(201);
    expect((await upkeepOf(2)).banks.find((b: { id: number }) => b.id === bankId)).toMatchObject({ status: 'over-limit', currentPa: 305 });
  });

  it('logs a filter change with who and the gauge before and after, and from then on reads the new filters', async () => {
    const res = await post(sprayer, '/api/filter-changes', { filterBankId: bankId, beforePa: 305, afterPa: 60, notes: 'All pockets replaced' }).expect(201);
    expect(res.body.filterChange).toMatchObject({ filterBankId: bankId, beforePa: 305, afterPa: 60, changedByName: 'Mina Castell' });
    const bank = (await upkeepOf(2)).banks.find((b: { id: number }) => b.id === bankId);
    expect(bank).toMatchObject({ status: 'ok', currentPa: 60, lastChange: { id: res.body.filterChange.id } });
    await post(assembler, '/api/filter-changes', { filterBankId: bankId }).expect(403);
  });

  it('refuses a reading from the future or from long ago, a negative pressure drop and a blank name, naming the field', async () => {
    const ahead = await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bankId, pressureDropPa: 100, at: new Date(Date.now() + 3_600_000).toISOString() }).expect(400);
    expect(ahead.body.error.fields).toHaveProperty('at');
    const longAgo = await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bankId, pressureDropPa: 100, at: new Date(Date.now() - 91 * 86_400_000).toISOString() }).expect(400);
    expect(longAgo.body.error.fields.at).toMatch(/within the last 90 days/);
    const oldChange = await post(sprayer, '/api/filter-changes', { filterBankId: bankId, changedAt: new Date(Date.now() - 91 * 86_400_000).toISOString() }).expect(400);
    expect(oldChange.body.error.fields).toHaveProperty('changedAt');
    const blank = await post(lead, '/api/filter-banks', { boothId: 2, name: '\u200b\u00a0', kind: 'exhaust', changeAtPa: 250 }).expect(400);
    expect(blank.body.error.fields).toHaveProperty('name');
    const negative = await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bankId, pressureDropPa: -4 }).expect(400);
    expect(negative.body.error.fields).toHaveProperty('pressureDropPa');
  });

  it('takes a gauge reading from the booth’s sensor token for its own booth’s banks only', async () => {
    const token = (await post(lead, '/api/booths/2/sensor-token', {}).expect(201)).body.token as string;
    const ok = await request(ctx.app).post('/api/readings/filter-gauge').set('Authorization', `Bearer ${token}`).send({ filterBankId: bankId, pressureDropPa: 75 }).expect(201);
    expect(ok.body.reading).toMatchObject({ source: 'sensor', recordedByName: 'Booth sensor', pressureDropPa: 75 });
    const boothOneBank = (await upkeepOf(1)).banks[0].id;
    await request(ctx.app).post('/api/readings/filter-gauge').set('Authorization', `Bearer ${token}`).send({ filterBankId: boothOneBank, pressureDropPa: 75 }).expect(403);
    // The token is for readings only: logging a filter change needs a person.
    await request(ctx.app).post('/api/filter-changes').set('Authorization', `Bearer ${token}`).send({ filterBankId: bankId }).expect(403);
  });

  it('lets a lead retire a bank: it leaves the fit-to-spray checks but stays on the booth’s record', async () => {
    const res = await lead.agent.patch(`/api/filter-banks/${bankId}`).set('x-csrf-token', lead.csrf).send({ active: false }).expect(200);
    expect(res.body.filterBank.active).toBe(false);
    const banks = (await upkeepOf(2)).banks;
    expect(banks.find((b: { id: number }) => b.id === bankId).active).toBe(false);
  });
});

describe('extraction tests', () => {
  it('works out the mean face velocity and the next due date from the shop’s interval', async () => {
    const testedOn = today();
    const res = await post(lead, '/api/extraction-tests', { boothId: 1, testedOn, faceVelocityPointsMps: [0.52, 0.48, 0.55, 0.45], clearanceMin: 3.5, testedBy: 'Fellgate Airflow Testing' }).expect(201);
    // (0.52 + 0.48 + 0.55 + 0.45) / 4 = 0.50 m/s, worked by hand; booth 1's minimum is 0.5 m/s.
    expect(res.body.extractionTest).toMatchObject({ meanFaceVelocityMps: 0.5, meetsMinimum: true, clearanceMin: 3.5, recordedByName: 'Dev Okafor' });
    // The default interval is HSE HSG258's 14 months.
    expect(res.body.extractionTest.nextDueOn).toBe(addCalendarMonths(testedOn, 14));
    const upkeep = await upkeepOf(1);
    expect(upkeep.extraction).toMatchObject({ status: 'valid', latest: { id: res.body.extractionTest.id } });
  });

  it('keeps a next due date the tester gave, and says when the face velocity was below the booth’s minimum', async () => {
    const res = await post(admin, '/api/extraction-tests', { boothId: 2, testedOn: today(), faceVelocityPointsMps: [0.3, 0.32], testedBy: 'Fellgate Airflow Testing', nextDueOn: addCalendarMonths(today(), 6) }).expect(201);
    expect(res.body.extractionTest).toMatchObject({ meetsMinimum: false, nextDueOn: addCalendarMonths(today(), 6) });
  });

  it('refuses a test dated in the future, a due date before the test, no readings, and a sprayer', async () => {
    const body = { boothId: 1, testedOn: addCalendarMonths(today(), 1), faceVelocityPointsMps: [0.5], testedBy: 'Someone' };
    expect((await post(lead, '/api/extraction-tests', body).expect(400)).body.error.fields).toHaveProperty('testedOn');
    expect((await post(lead, '/api/extraction-tests', { ...body, testedOn: '2025-01-10', nextDueOn: '2025-01-09' }).expect(400)).body.error.fields).toHaveProperty('nextDueOn');
    expect((await post(lead, '/api/extraction-tests', { ...body, testedOn: '2025-01-10', faceVelocityPointsMps: [] }).expect(400)).body.error.fields).toHaveProperty('faceVelocityPointsMps');
    await post(sprayer, '/api/extraction-tests', { ...body, testedOn: '2025-01-10' }).expect(403);
  });
});

describe('fire-protection inspections', () => {
  it('records an inspection, due again after the shop’s 12 months, and a failed one as failed', async () => {
    const res = await post(lead, '/api/fire-inspections', { boothId: 1, inspectedOn: '2025-01-31', inspectedBy: 'Keldmoor Fire Services', passed: true }).expect(201);
    // 31 January + 12 months: 31 January (yearly is common practice, no published source).
    expect(res.body.fireInspection.nextDueOn).toBe('2026-01-31');
    const failed = await post(lead, '/api/fire-inspections', { boothId: 2, inspectedOn: today(), inspectedBy: 'Keldmoor Fire Services', passed: false, notes: 'Extinguisher discharged' }).expect(201);
    expect((await upkeepOf(2)).fire.latest).toMatchObject({ id: failed.body.fireInspection.id, passed: false });
    expect((await post(lead, '/api/fire-inspections', { boothId: 1, inspectedOn: '2025-01-31', inspectedBy: 'K' }).expect(400)).body.error.fields).toMatchObject({ inspectedBy: expect.any(String), passed: expect.any(String) });
  });
});

describe('the records are evidence', () => {
  it('cannot be changed or deleted, even by hand-written SQL', async () => {
    await expect(ctx.dataSource.query('UPDATE filter_changes SET after_pa = 1')).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM extraction_tests')).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM crew_records')).rejects.toThrow(/append_only/);
  });
});

describe('GET /api/upkeep/due', () => {
  it('lists for a lead the booths and people not fit or due soon, with no dates about people', async () => {
    const due = (await lead.agent.get('/api/upkeep/due').expect(200)).body.due;
    expect(due.wholeCrew).toBe(true);
    // The demo shop: booth 1's arrestor pads near their limit; Mina's fit test due within the month.
    const boothOne = due.booths.find((b: { boothId: number }) => b.boothId === 1);
    expect(boothOne.items.map((i: { kind: string; status: string }) => `${i.kind}:${i.status}`)).toContain('filter:near-limit');
    const mina = due.crew.find((c: { name: string }) => c.name === 'Mina Castell');
    expect(mina).toMatchObject({ fit: true, items: [{ kind: 'fit-test', status: 'due-soon', message: 'The face-fit test is due soon.' }] });
    expect(JSON.stringify(due.crew)).not.toMatch(/\d{4}-\d{2}-\d{2}/);
  });

  it('reads each booth’s own newest gauge reading, whatever the other booths read', async () => {
    const bank = (await post(lead, '/api/filter-banks', { boothId: 2, name: 'Exhaust roll', kind: 'exhaust', changeAtPa: 300 }).expect(201)).body.filterBank;
    const dueOf = async (boothId: number) => ((await lead.agent.get('/api/upkeep/due').expect(200)).body.due.booths.find((b: { boothId: number }) => b.boothId === boothId)?.items ?? []).map((i: { kind: string; status: string }) => `${i.kind}:${i.status}`);
    await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bank.id, pressureDropPa: 320 }).expect(201);
    expect(await dueOf(2)).toContain('filter:over-limit');
    expect(await dueOf(1)).toContain('filter:near-limit');
    await post(sprayer, '/api/readings/filter-gauge', { filterBankId: bank.id, pressureDropPa: 90 }).expect(201);
    expect((await dueOf(2)).filter((i: string) => i.startsWith('filter:'))).toEqual([]);
    expect(await dueOf(1)).toContain('filter:near-limit');
  });

  it('shows a sprayer only their own crew records, and a wider window on request', async () => {
    const due = (await sprayer.agent.get('/api/upkeep/due').expect(200)).body.due;
    expect(due.wholeCrew).toBe(false);
    expect(due.crew.map((c: { name: string }) => c.name)).toEqual(['Mina Castell']);
    const wide = (await lead.agent.get('/api/upkeep/due?withinDays=365').expect(200)).body.due;
    expect(wide.crew.find((c: { name: string }) => c.name === 'Dev Okafor').items.map((i: { kind: string }) => i.kind)).toContain('fit-test');
    await lead.agent.get('/api/upkeep/due?withinDays=1e3').expect(400);
    await assembler.agent.get('/api/upkeep/due').expect(403);
  });
});
