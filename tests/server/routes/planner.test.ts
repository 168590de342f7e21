import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let jobId: number;
// Monday 4 January 2027, 08:00 in London (GMT in winter).
const clock = { now: () => new Date('2027-01-04T08:00:00Z') };

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
