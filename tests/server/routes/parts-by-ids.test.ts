import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

describe('GET /api/parts?ids=', () => {
  it('answers the parts named, in id order, each as GET /api/parts/:id answers it', async () => {
    const { agent } = await signIn(ctx.app, demo.sprayer);
    const res = await agent.get('/api/parts?ids=3,1,2,1').expect(200);
    expect(res.body.items.map((p: { id: number }) => p.id)).toEqual([1, 2, 3]);
    expect(res.body.total).toBe(3);
    const one = await agent.get('/api/parts/2').expect(200);
    expect(res.body.items[1]).toEqual(one.body.part);
  });

  it('leaves out ids that name no part', async () => {
    const { agent } = await signIn(ctx.app, demo.assembler);
    const res = await agent.get('/api/parts?ids=1,999999').expect(200);
    expect(res.body.items.map((p: { id: number }) => p.id)).toEqual([1]);
  });

  it('answers 400 with a field message for ids that are not plain whole numbers, or too many', async () => {
    const { agent } = await signIn(ctx.app, demo.lead);
    for (const ids of ['', '1,,2', '0x10', '1e3', '-1', '1, 2']) {
      const res = await agent.get('/api/parts').query({ ids }).expect(400);
      expect(res.body.error.fields).toHaveProperty('ids');
    }
    const many = Array.from({ length: 501 }, (_, i) => i + 1).join(',');
    const res = await agent.get(`/api/parts?ids=${many}`).expect(400);
    expect(res.body.error.fields.ids).toMatch(/500/);
    await agent.get('/api/parts').expect(400);
  });
});
