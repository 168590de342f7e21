import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let assembler: SignedIn;

beforeAll(async () => {
  ctx = await startTestApp();
  lead = await signIn(ctx.app, demo.lead);
  assembler = await signIn(ctx.app, demo.assembler);
});
afterAll(async () => ctx?.close());

describe('collecting a part from its rack', () => {
  it('frees the shelf, and undo puts the part back where it stood', async () => {
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-105').expect(200)).body.items[0];
    const part = (await lead.agent.get(`/api/jobs/${job.id}/parts`).expect(200)).body.items[0];
    const rack = (await lead.agent.get('/api/racks').expect(200)).body.items[0];
    await lead.agent.patch(`/api/parts/${part.id}`).set('x-csrf-token', lead.csrf).send({ rackId: rack.id, shelf: 2 }).expect(200);

    const collected = await assembler.agent.post(`/api/parts/${part.id}/collect`).set('x-csrf-token', assembler.csrf).expect(200);
    expect(collected.body.part).toMatchObject({ rackId: null, shelf: null, state: 'collected' });

    const undone = await assembler.agent.delete(`/api/parts/${part.id}/collect`).set('x-csrf-token', assembler.csrf).expect(200);
    expect(undone.body.part).toMatchObject({ rackId: rack.id, shelf: 2, state: 'waiting' });
    const trail = (await lead.agent.get('/api/audit?pageSize=5').expect(200)).body.items.map((e: { summary: string }) => e.summary);
    expect(trail[0]).toContain(`back as not collected on ${rack.name} shelf 2`);
  });
});
