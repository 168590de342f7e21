import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

describe('concurrent writes', () => {
  it('keeps every change and its audit entry when many requests write at once, even when some fail', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const before = (await agent.get('/api/audit?pageSize=1')).body.total;
    const requests = Array.from({ length: 30 }, (_, i) =>
      // Every third request reuses a reference, so its transaction rolls back while others commit.
      agent.post('/api/jobs').set('x-csrf-token', csrf).send({ customer: `C${i}`, reference: `PAR-${i % 3 === 0 ? 'X' : i}`, dueDate: '2027-02-01' }),
    );
    const statuses = (await Promise.all(requests)).map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(21);
    expect(statuses.filter((s) => s === 409)).toHaveLength(9);
    const jobs = await agent.get('/api/jobs?q=PAR-&pageSize=100').expect(200);
    expect(jobs.body.total).toBe(21);
    const after = (await agent.get('/api/audit?pageSize=1')).body.total;
    expect(after - before).toBe(21);
  });
});
