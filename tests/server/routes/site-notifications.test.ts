import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startNotifications, type NotificationRuntime } from '../../../server/mail/notifications-runtime';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { timelineStartingYesterday } from '../../helpers/timeline';

// E-mail about a site's coats and bookings goes to that site's people (and the admins), not to every site.
let ctx: TestContext;
let runtime: NotificationRuntime;
let lead: SignedIn;

// The test's timeline, written for 1 March 2027, happens yesterday: the coats it logs must lie
// near now, and the times of day stay as written.
const at = timelineStartingYesterday('2027-03-01');

const post = (who: SignedIn, path: string, body: object) => who.agent.post(path).set('x-csrf-token', who.csrf).send(body);
const waitFor = async (check: () => boolean) => {
  for (let i = 0; i < 50 && !check(); i++) await new Promise((r) => setTimeout(r, 50));
};

beforeAll(async () => {
  ctx = await startTestApp();
  runtime = await startNotifications(ctx.dataSource, { ...ctx.config, fakeSmtpPort: 0, smtpUrl: undefined }, pino({ level: 'silent' }), { schedule: false });
  const admin = await signIn(ctx.app, demo.admin);
  lead = await signIn(ctx.app, demo.lead);
  const site = (await post(admin, '/api/sites', { name: 'Quiet site' }).expect(201)).body.site.id;
  for (const role of ['lead', 'assembler']) {
    await post(admin, '/api/users', { email: `${role}.quiet@larchmere.test`, name: `Quiet ${role}`, role, password: 'quiet-site-2026', siteId: site }).expect(201);
  }
});
afterAll(async () => {
  await runtime.stop();
  await ctx.close();
});

describe('e-mail across sites', () => {
  it('tells the first site’s assembler a part can be handled, and nobody at another site', async () => {
    const booth = (await post(lead, '/api/booths', { name: 'Mail booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201)).body.booth.id;
    const sprayerId = (await lead.agent.get('/api/sprayers').expect(200)).body.items.find((u: { role: string }) => u.role === 'sprayer').id;
    const spraySession = (await post(lead, '/api/spray-sessions', { boothId: booth, start: at('2027-03-01T07:00:00Z'), end: at('2027-03-01T16:00:00Z'), sprayerId }).expect(201)).body.spraySession.id;
    // The demo drawer-box job: sealer, denib, precat clear. Handling follows the clear by an hour at 20 °C.
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-102')).body.items[0];
    const partIds = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items.slice(0, 1).map((p: { id: number }) => p.id);
    for (const [name, sprayedAt, stepPosition] of [['Sanding Sealer', at('2027-03-01T08:00:00Z'), 0], ['Precat Clear', at('2027-03-01T09:00:00Z'), 2]] as const) {
      const productId = (await lead.agent.get(`/api/products?q=${encodeURIComponent(name)}`)).body.items[0].id;
      await post(lead, '/api/coats', { spraySessionId: spraySession, partIds, productId, sprayedAt, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, stepPosition }).expect(201);
    }
    await runtime.service.tick(new Date(at('2027-03-01T10:05:00Z')));
    await waitFor(() => runtime.mailbox!.messages.some((m) => m.subject.startsWith('Ready to handle') && m.to.includes('assembler@larchmere.test')));
    const ready = runtime.mailbox!.messages.filter((m) => m.subject.startsWith('Ready to handle')).map((m) => m.to);
    expect(ready.join(' ')).toContain('assembler@larchmere.test');
    expect(ready.filter((to) => to.includes('quiet@larchmere.test'))).toEqual([]);
  });
});
