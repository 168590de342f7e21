import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

/** Opens the change stream as `watcher`, runs `change`, and answers the stream's text once `expected` shows in it. */
async function streamWhile(watcher: SignedIn, change: () => Promise<unknown>, expected: string): Promise<string> {
  const cookie = (await watcher.agent.get('/api/auth/me')).request.cookies;
  const server = ctx.app.listen(0);
  const { port } = server.address() as AddressInfo;
  const controller = new AbortController();
  try {
    const response = await fetch(`http://127.0.0.1:${port}/api/events`, {
      headers: { cookie },
      signal: controller.signal,
    });
    const reader = response.body!.getReader();
    await reader.read();
    await change();
    let text = '';
    while (!text.includes(expected)) text += new TextDecoder().decode((await reader.read()).value);
    return text;
  } finally {
    controller.abort();
    server.close();
  }
}

describe('GET /api/events: data sheets and finish systems', () => {
  it('streams product.changed to every site when a data sheet changes, so open spray sessions show the new sheet', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    const lead = await signIn(ctx.app, demo.lead);
    const text = await streamWhile(
      sprayer,
      () =>
        lead.agent
          .patch('/api/products/1')
          .set('x-csrf-token', lead.csrf)
          .send({ name: 'Kestrel primer (new sheet)' })
          .expect(200),
      'product.changed',
    );
    expect(text).toContain('"id":1');
  });

  it('streams finish-system.changed when a finish system changes', async () => {
    const assembler = await signIn(ctx.app, demo.assembler);
    const lead = await signIn(ctx.app, demo.lead);
    const text = await streamWhile(
      assembler,
      () =>
        lead.agent
          .patch('/api/finish-systems/1')
          .set('x-csrf-token', lead.csrf)
          .send({ name: 'Clear oak, precat matt (revised)' })
          .expect(200),
      'finish-system.changed',
    );
    expect(text).toContain('"id":1');
  });
});
