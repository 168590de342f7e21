import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let jobId: number;
// Monday 4 January 2027, 08:00 in London (GMT in winter); moved on when a test logs a coat.
const clock = { at: new Date('2027-01-04T08:00:00Z'), now() { return this.at; } };

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  lead = await signIn(ctx.app, demo.lead);
  jobId = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0].id;
});
afterAll(async () => ctx.close());

describe('POST /api/planner/proposals', () => {
  it('proposes the job’s three coats in opening hours, each after the previous recoat window opens', async () => {
    const res = await lead.agent.post('/api/planner/proposals').set('x-csrf-token', lead.csrf).send({ jobIds: [jobId] }).expect(200);
    const sessions = res.body.plan.sessions;
    expect(sessions.map((s: { stepPosition: number }) => s.stepPosition)).toEqual([0, 2, 3]);
    for (const s of sessions) {
      const hour = new Date(s.start).getUTCHours();
      expect(hour).toBeGreaterThanOrEqual(7);
      expect(new Date(s.end).getUTCHours() * 60 + new Date(s.end).getUTCMinutes()).toBeLessThanOrEqual(17 * 60);
    }
    // The demo primer's recoat opens 120 min after the coat at 20 °C (the shop's planning temperature), plus a 30 min denib.
    expect(Date.parse(sessions[1].start) - Date.parse(sessions[0].end)).toBeGreaterThanOrEqual(150 * 60_000);
    expect(res.body.plan.jobs[0]).toMatchObject({ jobId, reference: 'LJ-26-105' });
  });

  it('answers 403 to a sprayer', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await sprayer.agent.post('/api/planner/proposals').set('x-csrf-token', sprayer.csrf).send({}).expect(403);
  });
});

describe('POST /api/planner/accept', () => {
  it('books every proposed session, or none when one clashes', async () => {
    const proposal = (await lead.agent.post('/api/planner/proposals').set('x-csrf-token', lead.csrf).send({ jobIds: [jobId] })).body.plan;
    const wanted = proposal.sessions.map((s: { boothId: number; start: string; end: string; partIds: number[]; stepPosition: number }) => ({
      boothId: s.boothId,
      start: s.start,
      end: s.end,
      items: s.partIds.map((partId) => ({ partId, stepPosition: s.stepPosition })),
    }));
    const accepted = await lead.agent.post('/api/planner/accept').set('x-csrf-token', lead.csrf).send({ sessions: wanted }).expect(201);
    expect(accepted.body.items).toHaveLength(3);
    const before = (await lead.agent.get('/api/spray-sessions?from=2027-01-01T00:00:00Z&to=2027-02-01T00:00:00Z')).body.total;
    await lead.agent.post('/api/planner/accept').set('x-csrf-token', lead.csrf).send({ sessions: wanted }).expect(409);
    const after = (await lead.agent.get('/api/spray-sessions?from=2027-01-01T00:00:00Z&to=2027-02-01T00:00:00Z')).body.total;
    expect(after).toBe(before);
  });
});

describe('proposals start from what is booked and what is sprayed', () => {
  type Proposed = { stepPosition: number; boothId: number; start: string; end: string; partIds: number[] };
  let drawers: number;
  let sealerSession: { id: number; end: string };
  const propose = async (): Promise<{ sessions: Proposed[]; jobs: { notes: string[] }[] }> =>
    (await lead.agent.post('/api/planner/proposals').set('x-csrf-token', lead.csrf).send({ jobIds: [drawers] }).expect(200)).body.plan;

  beforeAll(async () => {
    drawers = (await lead.agent.get('/api/jobs?q=LJ-26-102')).body.items[0].id;
  });

  it('does not propose a coat already booked, and plans the next one after that booking’s recoat window', async () => {
    // The drawer boxes' system: sanding sealer, P320 denib, precat clear.
    const first = await propose();
    expect(first.sessions.map((s) => s.stepPosition)).toEqual([0, 2]);
    const sealer = first.sessions[0];
    const booked = await lead.agent
      .post('/api/planner/accept')
      .set('x-csrf-token', lead.csrf)
      .send({ sessions: [{ boothId: sealer.boothId, start: sealer.start, end: sealer.end, items: sealer.partIds.map((partId) => ({ partId, stepPosition: 0 })) }] })
      .expect(201);
    sealerSession = booked.body.items[0];

    const again = await propose();
    expect(again.sessions.map((s) => s.stepPosition)).toEqual([2]);
    expect(again.jobs[0].notes[0]).toMatch(/^Coat 1 of \d \(Kestrel Sanding Sealer NC\) is already booked \w{3} \d{1,2} \w{3}, \d\d:\d\d; not proposed again\.$/);
    // The sealer's recoat opens 30 min after it goes on at 20 °C (its data sheet row), then a 30 min denib.
    expect(Date.parse(again.sessions[0].start) - Date.parse(sealerSession.end)).toBeGreaterThanOrEqual(60 * 60_000);
  });

  it('marks the parts already sprayed in a booked session, and proposes the coat again only for the rest once it is cancelled', async () => {
    const parts: { id: number }[] = (await lead.agent.get(`/api/jobs/${drawers}/parts?pageSize=200`)).body.items;
    const sealerId = (await lead.agent.get('/api/products?q=Sanding Sealer')).body.items[0].id;
    const sprayed = parts.slice(0, 40).map((p) => p.id);
    // The coat is logged as the booked session ends (a coat is never logged ahead of time).
    clock.at = new Date(sealerSession.end);
    await lead.agent
      .post('/api/coats')
      .set('x-csrf-token', lead.csrf)
      .send({ spraySessionId: sealerSession.id, partIds: sprayed, productId: sealerId, sprayedAt: sealerSession.end, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 })
      .expect(201);

    const session = (await lead.agent.get(`/api/spray-sessions/${sealerSession.id}`).expect(200)).body.spraySession;
    const done = session.items.filter((i: { sprayedAt: string | null }) => i.sprayedAt !== null).map((i: { partId: number }) => i.partId);
    expect(done.sort((a: number, b: number) => a - b)).toEqual([...sprayed].sort((a, b) => a - b));
    expect(session.work).toMatchObject({ partCount: 80, sprayedCount: 40, jobs: [{ id: drawers, reference: 'LJ-26-102', colour: 'Natural' }] });
    expect(session.work.coats).toEqual([
      { jobId: drawers, jobReference: 'LJ-26-102', colour: 'Natural', stepPosition: 0, coatNumber: 1, coatsTotal: 2, productId: sealerId, productName: 'Kestrel Sanding Sealer NC', partCount: 80, sprayedCount: 40 },
    ]);

    await lead.agent.patch(`/api/spray-sessions/${sealerSession.id}`).set('x-csrf-token', lead.csrf).send({ state: 'cancelled' }).expect(200);
    const after = await propose();
    expect(after.sessions.map((s) => s.stepPosition)).toEqual([0, 2]);
    expect(after.sessions[0].partIds).toHaveLength(40);
    expect(after.sessions[0].partIds.some((id) => sprayed.includes(id))).toBe(false);
    expect(after.sessions[1].partIds).toHaveLength(80);
  });

  it('shows the recoat window the previous coat leaves on a booked next coat, worked out from its booking until it is sprayed', async () => {
    const plan = await propose();
    const [sealer, precat] = plan.sessions;
    const accepted = await lead.agent
      .post('/api/planner/accept')
      .set('x-csrf-token', lead.csrf)
      .send({ sessions: [sealer, precat].map((s) => ({ boothId: s.boothId, start: s.start, end: s.end, items: s.partIds.map((partId) => ({ partId, stepPosition: s.stepPosition })) })) })
      .expect(201);
    const next = accepted.body.items[1];
    // 40 parts have the sealer on record (its window opens 30 min after the coat went on); the other 40
    // are booked in the new sealer session, whose window opens 30 min after it ends: the later one counts.
    const opens = Math.max(Date.parse(sealerSession.end), Date.parse(sealer.end)) + 30 * 60_000;
    expect(next.work.recoatWindow).toEqual({ opensAt: new Date(opens).toISOString(), closesAt: null, projected: true });
    expect(next.work.coats[0]).toMatchObject({ coatNumber: 2, coatsTotal: 2, productName: 'Kestrel Precat Clear Matt', partCount: 80, sprayedCount: 0 });
  });
});
