import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

const clock = { at: new Date('2027-04-05T08:00:00Z'), now() { return this.at; } };
const at = (iso: string) => (clock.at = new Date(iso));

let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let assembler: SignedIn;
let sessionId: number;
let primerId: number;
let oneCoatSystemId: number;
let rackId: number;

const post = (who: SignedIn, url: string, body: object = {}) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const patch = (who: SignedIn, url: string, body: object) => who.agent.patch(url).set('x-csrf-token', who.csrf).send(body);
const job = async (id: number) => (await lead.agent.get(`/api/jobs/${id}`).expect(200)).body.job;
const listed = async (query: string) => (await lead.agent.get(`/api/jobs?${query}&pageSize=200`).expect(200)).body.items.map((j: { reference: string }) => j.reference);

async function newJob(reference: string, parts = 2): Promise<{ id: number; partIds: number[] }> {
  const created = await post(lead, '/api/jobs', { customer: 'Life Cycle Ltd', reference, dueDate: '2027-04-06', finishSystemId: oneCoatSystemId }).expect(201);
  const partIds: number[] = [];
  for (let n = 1; n <= parts; n++) partIds.push((await post(lead, `/api/jobs/${created.body.job.id}/parts`, { label: `Panel ${n}`, lengthMm: 800, widthMm: 400, thicknessMm: 18, rackId, shelf: n }).expect(201)).body.part.id);
  return { id: created.body.job.id, partIds };
}

/** Logs a coat as it goes on: the server's clock is moved up to `sprayedAt` first (a coat is never logged ahead of time). */
const coat = (partIds: number[], sprayedAt: string) => {
  if (clock.at.getTime() < Date.parse(sprayedAt)) at(sprayedAt);
  return post(sprayer, '/api/coats', { spraySessionId: sessionId, partIds, productId: primerId, sprayedAt, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }).expect(201);
};

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  [lead, sprayer, assembler] = await Promise.all([signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
  primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
  oneCoatSystemId = (await post(lead, '/api/finish-systems', { name: 'One primer coat', steps: [{ kind: 'coat', productId: primerId, dryFilmUm: 60 }] }).expect(201)).body.finishSystem.id;
  rackId = (await post(lead, '/api/racks', { name: 'Life cycle rack', location: 'drying-room', shelves: 10, shelfAreaM2: 1 }).expect(201)).body.rack.id;
  const booth = await post(lead, '/api/booths', { name: 'Life cycle booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  sessionId = (await post(lead, '/api/spray-sessions', { boothId: booth.body.booth.id, start: '2027-04-05T08:00:00Z', end: '2027-04-05T12:00:00Z', sprayerId: 3 }).expect(201)).body.spraySession.id;
});
afterAll(async () => ctx?.close());

describe('a job’s life cycle', () => {
  it('goes open → in finish → ready → delivered by itself, each step in the activity log', async () => {
    const { id, partIds } = await newJob('LC-1');
    expect(await job(id)).toMatchObject({ state: 'open', stateSetBy: 'auto', readyAt: null });

    await coat([partIds[0]], '2027-04-05T08:30:00Z');
    expect(await job(id)).toMatchObject({ state: 'in-finish', readyAt: null });
    // The demo primer's 20 °C row: handle 180 min after the coat. The last part sets the job's time.
    await coat([partIds[1]], '2027-04-05T09:00:00Z');
    expect(await job(id)).toMatchObject({ state: 'in-finish', readyAt: '2027-04-05T12:00:00.000Z' });
    expect(await listed('state=in-finish')).toContain('LC-1');

    at('2027-04-05T12:00:00Z');
    expect(await job(id)).toMatchObject({ state: 'ready' });
    expect(await listed('state=ready')).toContain('LC-1');
    expect(await listed('state=in-finish')).not.toContain('LC-1');

    await post(assembler, `/api/parts/${partIds[0]}/collect`).expect(200);
    expect((await job(id)).state).toBe('ready');
    await post(assembler, `/api/parts/${partIds[1]}/collect`).expect(200);
    expect(await job(id)).toMatchObject({ state: 'delivered', stateSetBy: 'auto' });
    expect(await listed('state=delivered')).toContain('LC-1');
    expect(await listed('state=active')).not.toContain('LC-1');

    // Undo of a mis-tap puts the job back.
    await assembler.agent.delete(`/api/parts/${partIds[1]}/collect`).set('x-csrf-token', assembler.csrf).expect(200);
    expect((await job(id)).state).toBe('ready');
    const trail = (await lead.agent.get('/api/audit?pageSize=50').expect(200)).body.items.map((e: { summary: string }) => e.summary);
    expect(trail).toEqual(expect.arrayContaining(['Job LC-1 is in finish (was open)', 'Job LC-1 is delivered (was ready)', 'Job LC-1 is ready (was delivered)']));
  });

  it('lets a lead set the state, with an audit entry; delivered and cancelled stay until a lead changes them', async () => {
    const { id, partIds } = await newJob('LC-2', 1);
    const set = await patch(lead, `/api/jobs/${id}`, { state: 'cancelled' }).expect(200);
    expect(set.body.job).toMatchObject({ state: 'cancelled', stateSetBy: 'lead' });
    await coat(partIds, '2027-04-05T12:05:00Z');
    expect((await job(id)).state).toBe('cancelled');
    const trail = (await lead.agent.get('/api/audit?pageSize=20').expect(200)).body.items.map((e: { summary: string }) => e.summary);
    expect(trail).toContain('Set job LC-2 to cancelled (was open)');
    // A lead's "in finish" stands until the next thing recorded on the job moves it on.
    await patch(lead, `/api/jobs/${id}`, { state: 'in-finish' }).expect(200);
    await post(assembler, `/api/parts/${partIds[0]}/collect`).expect(200);
    expect(await job(id)).toMatchObject({ state: 'delivered', stateSetBy: 'auto' });
    await patch(assembler, `/api/jobs/${id}`, { state: 'open' }).expect(403);
    await patch(sprayer, `/api/jobs/${id}`, { state: 'open' }).expect(403);
  });

  it('reads the old value "finished" as delivered, in a change and in the list filter, and refuses unknown states', async () => {
    const { id } = await newJob('LC-3', 1);
    const res = await patch(lead, `/api/jobs/${id}`, { state: 'finished' }).expect(200);
    expect(res.body.job.state).toBe('delivered');
    expect(await listed('state=finished')).toContain('LC-3');
    const bad = await patch(lead, `/api/jobs/${id}`, { state: 'shipped' }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('state');
    await lead.agent.get('/api/jobs?state=shipped').expect(400);
  });

  it('goes back from delivered when a part is added to it', async () => {
    const { id, partIds } = await newJob('LC-4', 1);
    await coat(partIds, '2027-04-05T12:10:00Z');
    await post(assembler, `/api/parts/${partIds[0]}/collect`).expect(200);
    expect((await job(id)).state).toBe('delivered');
    await post(lead, `/api/jobs/${id}/parts`, { label: 'Forgotten panel', lengthMm: 800, widthMm: 400, thicknessMm: 18 }).expect(201);
    expect((await job(id)).state).toBe('in-finish');
  });
});

describe('GET /api/ready', () => {
  it('gives each job its ready-to-handle and ready-to-pack time, estimated while coats remain', async () => {
    at('2027-04-06T08:00:00Z');
    const { id, partIds } = await newJob('LC-5', 2);
    const before = (await assembler.agent.get(`/api/ready?jobId=${id}`).expect(200)).body;
    // Nothing sprayed: at the shop's expected 20 °C the primer's own row gives handle 180 and pack 480 min after now.
    expect(before.jobs).toEqual([expect.objectContaining({ jobId: id, handleAt: '2027-04-06T11:00:00.000Z', packAt: '2027-04-06T16:00:00.000Z', coatsRemaining: 2, projected: true, dryingTempC: 20 })]);
    expect(before.items[0]).toMatchObject({ coatsRemaining: 1, nextCoatAt: '2027-04-06T08:00:00.000Z', expectedHandleAt: '2027-04-06T11:00:00.000Z', handleAt: null });

    await coat([partIds[0]], '2027-04-06T08:00:00Z');
    at('2027-04-06T09:00:00Z');
    const after = (await assembler.agent.get(`/api/ready?jobId=${id}`).expect(200)).body;
    // Panel 1 is done (handle 11:00); panel 2 is still to spray, now: handle 12:00. The job waits for panel 2.
    expect(after.jobs[0]).toMatchObject({ handleAt: '2027-04-06T12:00:00.000Z', coatsRemaining: 1, projected: true });
    await coat([partIds[1]], '2027-04-06T09:00:00Z');
    const done = (await assembler.agent.get(`/api/ready?jobId=${id}`).expect(200)).body;
    expect(done.jobs[0]).toMatchObject({ handleAt: '2027-04-06T12:00:00.000Z', coatsRemaining: 0, projected: false });
  });

  it('shows collected parts under the rack they came from, and for longer when asked', async () => {
    const { partIds } = await newJob('LC-6', 1);
    await post(assembler, `/api/parts/${partIds[0]}/collect`).expect(200);
    const onRack = (await assembler.agent.get(`/api/ready?rackId=${rackId}`).expect(200)).body.items;
    expect(onRack.find((p: { id: number }) => p.id === partIds[0])).toMatchObject({ state: 'collected', rack: null, collectedFrom: { id: rackId, shelf: 1 }, collectedAt: '2027-04-06T09:00:00.000Z' });
    at('2027-04-16T09:00:00Z');
    const ids = async (query: string) => (await assembler.agent.get(`/api/ready?${query}`).expect(200)).body.items.map((p: { id: number }) => p.id);
    expect(await ids('')).not.toContain(partIds[0]);
    expect(await ids('collectedDays=30')).toContain(partIds[0]);
    expect(await ids(`rackId=${rackId}&collectedDays=30`)).toContain(partIds[0]);
    const bad = await assembler.agent.get('/api/ready?collectedDays=400').expect(400);
    expect(bad.body.error.fields).toHaveProperty('collectedDays');
  });

  it('dries a part whose job has no finish system from its coats: handle, pack and cure times on the board', async () => {
    at('2027-04-16T09:00:00Z');
    const created = await post(lead, '/api/jobs', { customer: 'Life Cycle Ltd', reference: 'LC-7', dueDate: '2027-04-20', finishSystemId: null }).expect(201);
    const partId = (await post(lead, `/api/jobs/${created.body.job.id}/parts`, { label: 'Loose panel', lengthMm: 800, widthMm: 400, thicknessMm: 18, rackId, shelf: 9 }).expect(201)).body.part.id;
    await coat([partId], '2027-04-16T09:00:00Z');
    at('2027-04-16T10:00:00Z');
    const board = (await assembler.agent.get(`/api/ready?jobId=${created.body.job.id}`).expect(200)).body;
    // The demo primer's 20 °C row: handle 180 min, pack 480 min, full cure 168 h after the coat.
    expect(board.items[0]).toMatchObject({ state: 'drying', coatsDone: 1, coatsTotal: 0, handleAt: '2027-04-16T12:00:00.000Z', packAt: '2027-04-16T17:00:00.000Z', fullCureAt: '2027-04-23T09:00:00.000Z' });
    expect(board.jobs[0]).toMatchObject({ handleAt: '2027-04-16T12:00:00.000Z', packAt: '2027-04-16T17:00:00.000Z', partsUnknown: 0 });
    at('2027-04-16T12:00:00Z');
    const later = (await assembler.agent.get(`/api/ready?jobId=${created.body.job.id}`).expect(200)).body;
    expect(later.items[0]).toMatchObject({ state: 'ready-to-handle' });
    expect(await job(created.body.job.id)).toMatchObject({ state: 'in-finish' });
  });
});
