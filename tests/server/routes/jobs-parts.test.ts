import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

async function newJob(reference: string) {
  const { agent, csrf } = await signIn(ctx.app, demo.lead);
  const res = await agent.post('/api/jobs').set('x-csrf-token', csrf).send({ customer: 'Test Co', reference, dueDate: '2027-01-15', finishSystemId: 1 }).expect(201);
  return { agent, csrf, job: res.body.job };
}

describe('/api/jobs', () => {
  it('lists the demo job book by due date with part counts and area', async () => {
    const { agent } = await signIn(ctx.app, demo.assembler);
    const res = await agent.get('/api/jobs').expect(200);
    expect(res.body.total).toBeGreaterThanOrEqual(6);
    const dueDates = res.body.items.map((j: { dueDate: string }) => j.dueDate);
    expect([...dueDates].sort()).toEqual(dueDates);
    const drawers = res.body.items.find((j: { reference: string }) => j.reference === 'LJ-26-102');
    expect(drawers).toMatchObject({ partCount: 80, partsThrough: 0, finishSystemName: 'Clear oak, precat matt' });
  });

  it('answers 409 for a reference already used and 400 for a bad date', async () => {
    const { agent, csrf } = await newJob('T-409');
    await agent.post('/api/jobs').set('x-csrf-token', csrf).send({ customer: 'X', reference: 'T-409', dueDate: '2027-01-01' }).expect(409);
    const bad = await agent.post('/api/jobs').set('x-csrf-token', csrf).send({ customer: 'X', reference: 'T-400', dueDate: '15/01/2027' }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('dueDate');
  });

  it('lets an assembler read jobs but not change them', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.assembler);
    await agent.get('/api/jobs/1').expect(200);
    await agent.patch('/api/jobs/1').set('x-csrf-token', csrf).send({ notes: 'x' }).expect(403);
  });
});

describe('parts', () => {
  it('computes the coated area from size, faces and edges', async () => {
    const { agent, csrf, job } = await newJob('T-AREA');
    // 715 × 496 × 18, both faces and edges: 2·0.35464 + 2·(0.715 + 0.496)·0.018 = 0.752876 m² (worked by hand).
    const res = await agent.post(`/api/jobs/${job.id}/parts`).set('x-csrf-token', csrf).send({ label: 'Door', lengthMm: 715, widthMm: 496, thicknessMm: 18, quantity: 2 }).expect(201);
    expect(res.body.part.pieceAreaM2).toBeCloseTo(0.752876, 6);
    expect(res.body.part.coatedAreaM2).toBeCloseTo(1.505752, 6);
    expect(res.body.part.tag).toMatch(/^[A-Z2-9]{8}$/);
    const byTag = await agent.get(`/api/parts/by-tag/${res.body.part.tag}`).expect(200);
    expect(byTag.body.part.id).toBe(res.body.part.id);
  });

  it('answers 400 for a shelf the rack does not have', async () => {
    const { agent, csrf, job } = await newJob('T-SHELF');
    const res = await agent.post(`/api/jobs/${job.id}/parts`).set('x-csrf-token', csrf).send({ label: 'P', lengthMm: 100, widthMm: 100, thicknessMm: 18, rackId: 3, shelf: 99 }).expect(400);
    expect(res.body.error.fields.shelf).toMatch(/1 to 10/);
  });
});

describe('POST /api/jobs/:id/parts/import', () => {
  const good = 'label,lengthMm,widthMm,thicknessMm,quantity,faces,edges\nDoor A,715,496,18,2,both,yes\nPanel B,900,560,18,1,one,no\n';

  it('previews without saving, then saves every row', async () => {
    const { agent, csrf, job } = await newJob('T-CSV');
    const preview = await agent.post(`/api/jobs/${job.id}/parts/import`).set('x-csrf-token', csrf).field('preview', 'true').attach('file', Buffer.from(good), 'cut.csv').expect(200);
    expect(preview.body).toMatchObject({ saved: false, rowCount: 2, errors: [] });
    expect((await agent.get(`/api/jobs/${job.id}/parts`)).body.total).toBe(0);
    const saved = await agent.post(`/api/jobs/${job.id}/parts/import`).set('x-csrf-token', csrf).attach('file', Buffer.from(good), 'cut.csv').expect(201);
    expect(saved.body.items).toHaveLength(2);
    expect((await agent.get(`/api/jobs/${job.id}/parts`)).body.total).toBe(2);
  });

  it('maps the file’s own headers to our fields', async () => {
    const { agent, csrf, job } = await newJob('T-MAP');
    const csv = 'Part;L;W;T;Qty\nShelf;800;300;18;4\n';
    const mapping = JSON.stringify({ label: 'Part', lengthMm: 'L', widthMm: 'W', thicknessMm: 'T', quantity: 'Qty' });
    const res = await agent.post(`/api/jobs/${job.id}/parts/import`).set('x-csrf-token', csrf).field('mapping', mapping).attach('file', Buffer.from(csv), 'cut.csv').expect(201);
    expect(res.body.items[0]).toMatchObject({ label: 'Shelf', quantity: 4, faces: 'both', edges: true });
  });

  it('saves nothing when any row is bad and reports every bad row', async () => {
    const { agent, csrf, job } = await newJob('T-BAD');
    const csv = `${good}Broken,abc,496,18,1,both,yes\nNo size,,,,1,both,yes\n`;
    const res = await agent.post(`/api/jobs/${job.id}/parts/import`).set('x-csrf-token', csrf).attach('file', Buffer.from(csv), 'cut.csv').expect(400);
    expect(res.body.error.message).toMatch(/2 rows need fixing; nothing was saved/);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['rows.4.lengthMm', 'rows.5.lengthMm', 'rows.5.widthMm']));
    expect((await agent.get(`/api/jobs/${job.id}/parts`)).body.total).toBe(0);
  });
});

describe('GET /api/jobs/:id/estimate', () => {
  it('estimates each coat step of the job’s system over its area', async () => {
    const { agent } = await signIn(ctx.app, demo.lead);
    const jobs = await agent.get('/api/jobs?q=LJ-26-105').expect(200);
    const res = await agent.get(`/api/jobs/${jobs.body.items[0].id}/estimate?method=hvlp`).expect(200);
    const { estimate } = res.body;
    expect(estimate.transferEfficiencyPct).toBe(60);
    // Costs are in the shop's currency, from its settings.
    expect(estimate.currency).toBe('GBP');
    expect(estimate.steps.map((s: { productName: string }) => s.productName)).toEqual(['Kestrel 2K PU Primer White', 'Kestrel 2K PU Topcoat Satin', 'Kestrel 2K PU Topcoat Satin']);
    // Primer: area × DFT / (VS × 10 × TE) — the spreading-rate relation of the film module.
    const primer = estimate.steps[0];
    expect(primer.mixedL).toBeCloseTo((estimate.areaM2 * 60) / (45 * 10 * 0.6), 6);
    expect(estimate.totals.vocG).toBeGreaterThan(0);
  });
});
