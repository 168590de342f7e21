import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let sessionId: number;
const products = new Map<string, number>();

/** A new job with two parts, on the finish system a seeded job uses (or none), so its coats start from the first step. */
async function newJob(reference: string, finishSystemId: number | null): Promise<{ jobId: number; partIds: number[] }> {
  const job = (await lead.agent.post('/api/jobs').set('x-csrf-token', lead.csrf).send({ customer: 'Coat Place Ltd', reference, dueDate: '2027-03-20', finishSystemId }).expect(201)).body.job;
  const partIds: number[] = [];
  for (const label of ['Door 1', 'Door 2']) {
    const part = await lead.agent.post(`/api/jobs/${job.id}/parts`).set('x-csrf-token', lead.csrf).send({ label, lengthMm: 700, widthMm: 400, thicknessMm: 18 }).expect(201);
    partIds.push(part.body.part.id);
  }
  return { jobId: job.id, partIds };
}

async function systemOf(reference: string): Promise<number> {
  return (await lead.agent.get(`/api/jobs?q=${reference}`).expect(200)).body.items[0].finishSystemId;
}

const coat = (partIds: number[], product: string, sprayedAt: string, stepPosition: number | null = null) =>
  lead.agent
    .post('/api/coats')
    .set('x-csrf-token', lead.csrf)
    .send({ spraySessionId: sessionId, partIds, productId: products.get(product), sprayedAt, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, stepPosition })
    .expect(201);

let painted: { jobId: number; partIds: number[] };
let oak: { jobId: number; partIds: number[] };
let loose: { jobId: number; partIds: number[] };

beforeAll(async () => {
  ctx = await startTestApp({ clock: { now: () => new Date('2027-03-01T16:00:00Z') } });
  lead = await signIn(ctx.app, demo.lead);
  const booth = await lead.agent.post('/api/booths').set('x-csrf-token', lead.csrf).send({ name: 'Coat place booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  const session = await lead.agent
    .post('/api/spray-sessions')
    .set('x-csrf-token', lead.csrf)
    .send({ boothId: booth.body.booth.id, start: '2027-03-01T08:00:00Z', end: '2027-03-01T15:00:00Z', sprayerId: 3 })
    .expect(201);
  sessionId = session.body.spraySession.id;
  for (const item of (await lead.agent.get('/api/products?pageSize=100').expect(200)).body.items) products.set(item.name, item.id);
  painted = await newJob('CP-PAINTED', await systemOf('LJ-26-105'));
  oak = await newJob('CP-OAK', await systemOf('LJ-26-102'));
  loose = await newJob('CP-LOOSE', null);
});
afterAll(async () => ctx.close());

describe('a coat names its job and which coat of the finish system it is', () => {
  it('answers coat 1 of 3 with the job reference when the coat is recorded', async () => {
    const res = await coat(painted.partIds, 'Kestrel 2K PU Primer White', '2027-03-01T08:30:00Z');
    expect(res.body.coat).toMatchObject({ jobId: painted.jobId, jobReference: 'CP-PAINTED', partLabels: ['Door 1', 'Door 2'], stepPosition: 0, coatNumber: 1, coatsTotal: 3 });
  });

  it('counts coat steps only: the step after the denib is coat 2 of 3', async () => {
    const res = await coat(painted.partIds, 'Kestrel 2K PU Topcoat Satin', '2027-03-01T11:30:00Z', 2);
    expect(res.body.coat).toMatchObject({ stepPosition: 2, coatNumber: 2, coatsTotal: 3 });
  });

  it('gives no number and no total for a coat on a job with no finish system, and still names the job', async () => {
    const res = await coat(loose.partIds.slice(1), 'Kestrel 2K PU Primer White', '2027-03-01T09:00:00Z');
    expect(res.body.coat).toMatchObject({ jobId: loose.jobId, jobReference: 'CP-LOOSE', partLabels: ['Door 2'], stepPosition: null, coatNumber: null, coatsTotal: null });
  });

  it('answers every coat of a page across several jobs with its own job and system', async () => {
    await coat(oak.partIds, 'Kestrel Sanding Sealer NC', '2027-03-01T09:30:00Z');
    const page = (await lead.agent.get(`/api/coats?spraySessionId=${sessionId}&pageSize=10`).expect(200)).body;
    const rows = page.items.map((c: { jobReference: string; coatNumber: number | null; coatsTotal: number | null; productName: string }) => [c.jobReference, c.coatNumber, c.coatsTotal, c.productName]);
    // Newest first.
    expect(rows).toEqual([
      ['CP-PAINTED', 2, 3, 'Kestrel 2K PU Topcoat Satin'],
      ['CP-OAK', 1, 2, 'Kestrel Sanding Sealer NC'],
      ['CP-LOOSE', null, null, 'Kestrel 2K PU Primer White'],
      ['CP-PAINTED', 1, 3, 'Kestrel 2K PU Primer White'],
    ]);
  });

  it('keeps the job and the number on a corrected version', async () => {
    const first = (await lead.agent.get(`/api/coats?jobId=${oak.jobId}`).expect(200)).body.items[0];
    const corrected = await lead.agent.post(`/api/coats/${first.id}/corrections`).set('x-csrf-token', lead.csrf).send({ airTempC: 21, reason: 'Thermometer misread' }).expect(201);
    expect(corrected.body.coat).toMatchObject({ jobReference: 'CP-OAK', coatNumber: 1, coatsTotal: 2, version: 2 });
  });
});
