import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calendarDateIn } from '../../../shared/time';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let mina: SignedIn;
let assembler: SignedIn;
let pell: SignedIn;
let pellId: number;

const dayMs = 86_400_000;
const shopDate = (daysFromNow: number) => calendarDateIn(new Date(Date.now() + daysFromNow * dayMs), 'Europe/London');
const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const patch = (who: SignedIn, url: string, body: object) => who.agent.patch(url).set('x-csrf-token', who.csrf).send(body);
const goodChecks = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
type Finding = { code: string; severity: string; subject: string; message: string };
const codes = (findings: Finding[]) => findings.map((f) => `${f.severity}:${f.code}`);

let hour = 0;
/** A session on the spray room, today or soon, on the first coat step of a part of `job`, for `sprayerId`. */
async function bookSession(jobReference: string, sprayerId: number | null): Promise<number> {
  const job = (await lead.agent.get(`/api/jobs?q=${jobReference}`).expect(200)).body.items[0];
  const part = (await post(lead, `/api/jobs/${job.id}/parts`, { label: `Fitness part ${++hour}`, lengthMm: 600, widthMm: 300, thicknessMm: 18 }).expect(201)).body.part;
  const start = Date.parse('2027-03-01T00:00:00Z') + hour * 3 * 3_600_000;
  const body = { boothId: 2, start: new Date(start).toISOString(), end: new Date(start + 3_600_000).toISOString(), sprayerId, items: [{ partId: part.id, stepPosition: 0 }], override: { reason: 'Test booking at any hour' } };
  return (await post(lead, '/api/spray-sessions', body).expect(201)).body.spraySession.id;
}

beforeAll(async () => {
  ctx = await startTestApp();
  [admin, lead, mina, assembler] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
  pellId = (await post(admin, '/api/users', { email: 'pell@larchmere.test', name: 'Pell Armitage', role: 'sprayer', password: 'matrix-password-1' }).expect(201)).body.user.id;
  pell = await signIn(ctx.app, 'pell@larchmere.test', 'matrix-password-1');
  // Fit-tested 13 months ago on the shop's yearly interval: lapsed a month ago. No health surveillance.
  await post(admin, `/api/crew/${pellId}/records`, { kind: 'fit-test', doneOn: shopDate(-396), respiratorModel: 'Ostrel HM-200 half mask, size M', result: 'pass' }).expect(201);
});
afterAll(async () => ctx.close());

describe('GET /api/spray-sessions/:id/fitness', () => {
  it('stops a filter-mask session for a sprayer whose fit test has lapsed, and only cautions with air-fed protection', async () => {
    // LJ-26-102 starts with the solvent-borne sanding sealer: a vapour-and-particulate filter mask, tight-fitting.
    const id = await bookSession('LJ-26-102', pellId);
    const { fitness } = (await lead.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body;
    expect(fitness).toMatchObject({ crewShown: true, neededRespirator: 'vapour-and-particulate' });
    expect(fitness.byRespirator['vapour-and-particulate'].verdict).toBe('stop');
    expect(codes(fitness.byRespirator['vapour-and-particulate'].findings)).toContain('stop:fit-test-lapsed');
    const airFed = fitness.byRespirator['air-fed'].findings.find((f: Finding) => f.code === 'fit-test-lapsed');
    expect(airFed).toMatchObject({ severity: 'caution', message: expect.stringContaining('only to a tight-fitting facepiece') });
    expect(fitness.deferLine).toMatch(/safety data sheet/);
  });

  it('stops isocyanate work for a sprayer without health surveillance', async () => {
    // LJ-26-105 starts with the 2K PU primer, which contains isocyanate (HSE MR2: health surveillance).
    const id = await bookSession('LJ-26-105', pellId);
    const { fitness } = (await lead.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body;
    expect(fitness.neededRespirator).toBe('air-fed');
    expect(codes(fitness.byRespirator['air-fed'].findings)).toContain('stop:surveillance-none');
  });

  it('stops on a filter bank past its limit, for everyone who may read the booth’s upkeep', async () => {
    const id = await bookSession('LJ-26-102', null);
    const bank = (await lead.agent.get('/api/booths/2/upkeep').expect(200)).body.upkeep.banks[0];
    await post(mina, '/api/readings/filter-gauge', { filterBankId: bank.id, pressureDropPa: bank.changeAtPa + 15 }).expect(201);
    const { fitness } = (await mina.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body;
    expect(codes(fitness.byRespirator['vapour-and-particulate'].findings)).toEqual(expect.arrayContaining(['stop:filter-over-limit', 'caution:sprayer-none']));
    await post(mina, '/api/filter-changes', { filterBankId: bank.id, beforePa: bank.changeAtPa + 15, afterPa: 50 }).expect(201);
    const after = (await mina.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body.fitness;
    expect(codes(after.byRespirator['vapour-and-particulate'].findings)).not.toContain('stop:filter-over-limit');
  });

  it('leaves the sprayer’s records out for another sprayer, and refuses an assembler', async () => {
    const id = await bookSession('LJ-26-102', pellId);
    const { fitness } = (await mina.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body;
    expect(fitness.crewShown).toBe(false);
    expect(fitness.byRespirator['vapour-and-particulate'].findings.filter((f: Finding) => f.subject === 'sprayer')).toEqual([]);
    expect((await pell.agent.get(`/api/spray-sessions/${id}/fitness`).expect(200)).body.fitness.crewShown).toBe(true);
    await assembler.agent.get(`/api/spray-sessions/${id}/fitness`).expect(403);
  });
});

describe('the cautions and the pre-spray checklist', () => {
  it('adds the fit-to-spray findings to the session’s cautions, before the line that defers to the SDS', async () => {
    const id = await bookSession('LJ-26-102', pellId);
    const forLead = (await lead.agent.get(`/api/spray-sessions/${id}/cautions`).expect(200)).body.cautions;
    expect(forLead.map((c: { code: string }) => c.code)).toContain('fitness-fit-test-lapsed');
    expect(forLead.at(-1).code).toBe('defer');
    const forAssembler = (await assembler.agent.get(`/api/spray-sessions/${id}/cautions`).expect(200)).body.cautions;
    expect(forAssembler.map((c: { code: string }) => c.code)).not.toContain('fitness-fit-test-lapsed');
  });

  it('says stop at the checks when the sprayer’s fit test has lapsed; the sprayer cannot start or override, a lead can with a recorded reason', async () => {
    const id = await bookSession('LJ-26-102', pellId);
    const url = `/api/spray-sessions/${id}`;
    const checked = await patch(pell, url, { checklist: { ...goodChecks, respiratorKind: 'vapour-and-particulate' } }).expect(200);
    expect(checked.body.spraySession.checklist).toMatchObject({ verdict: 'stop', problems: expect.arrayContaining(['The sprayer’s face-fit test has lapsed.']) });
    await patch(pell, url, { state: 'spraying' }).expect(409);
    await patch(pell, url, { checklist: { ...goodChecks, respiratorKind: 'vapour-and-particulate', overrideReason: 'Mask fits fine' } }).expect(403);
    const overridden = await patch(lead, url, { checklist: { ...goodChecks, respiratorKind: 'vapour-and-particulate', overrideReason: 'Fit test booked for Monday; powered hood worn today' }, state: 'spraying' }).expect(200);
    expect(overridden.body.spraySession).toMatchObject({ state: 'spraying', checklist: { verdict: 'stop', overrideReason: 'Fit test booked for Monday; powered hood worn today' } });
  });

  it('lets the checks go ahead with air-fed protection, the lapsed fit test only a caution', async () => {
    const id = await bookSession('LJ-26-102', pellId);
    const res = await patch(pell, `/api/spray-sessions/${id}`, { checklist: { ...goodChecks, respiratorKind: 'air-fed' }, state: 'spraying' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.spraySession.checklist.verdict).not.toBe('stop');
    expect(res.body.spraySession.state).toBe('spraying');
  });
});
