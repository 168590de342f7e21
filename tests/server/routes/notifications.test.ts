import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startNotifications, type NotificationRuntime } from '../../../server/mail/notifications-runtime';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { timelineStartingYesterday } from '../../helpers/timeline';

let ctx: TestContext;
let runtime: NotificationRuntime;
let lead: SignedIn;
let sessionId: number;
let partIds: number[];

// The test's timeline, written for 1 March 2027, happens yesterday and today: the coats it logs
// must lie near now, and the times of day stay as written.
const at = timelineStartingYesterday('2027-03-01');

const waitFor = async (check: () => boolean) => {
  for (let i = 0; i < 50 && !check(); i++) await new Promise((r) => setTimeout(r, 50));
};

beforeAll(async () => {
  ctx = await startTestApp();
  // A real SMTP fake on a free port; the scheduler stays off so the test moves the clock itself.
  runtime = await startNotifications(ctx.dataSource, { ...ctx.config, fakeSmtpPort: 0, smtpUrl: undefined }, pino({ level: 'silent' }), { schedule: false });
  lead = await signIn(ctx.app, demo.lead);
  const booth = await lead.agent.post('/api/booths').set('x-csrf-token', lead.csrf).send({ name: 'Mail booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  const session = await lead.agent.post('/api/spray-sessions').set('x-csrf-token', lead.csrf).send({ boothId: booth.body.booth.id, start: at('2027-03-01T07:00:00Z'), end: at('2027-03-01T16:00:00Z'), sprayerId: 3 }).expect(201);
  sessionId = session.body.spraySession.id;
  // The demo drawer-box job uses the clear system: sealer, denib, precat clear.
  const job = (await lead.agent.get('/api/jobs?q=LJ-26-102')).body.items[0];
  partIds = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items.slice(0, 2).map((p: { id: number }) => p.id);
});
afterAll(async () => {
  await runtime.stop();
  await ctx.close();
});

async function coat(productName: string, sprayedAt: string, stepPosition: number) {
  const productId = (await lead.agent.get(`/api/products?q=${encodeURIComponent(productName)}`)).body.items[0].id;
  await lead.agent.post('/api/coats').set('x-csrf-token', lead.csrf).send({ spraySessionId: sessionId, partIds, productId, sprayedAt, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, stepPosition }).expect(201);
}

describe('e-mail notifications', () => {
  it('e-mails the sprayer when their session is booked', async () => {
    // The booking was made just now (the app runs on the real clock), so tick at the real time.
    await runtime.service.tick(new Date());
    await waitFor(() => runtime.mailbox!.messages.some((m) => m.subject.startsWith('Spray session booked')));
    const mail = runtime.mailbox!.messages.find((m) => m.subject.startsWith('Spray session booked'))!;
    expect(mail.to).toContain('sprayer@larchmere.test');
    // Named as people name it: the booth and its shop time (en-GB, no zone name), with a link to its page.
    expect(mail.subject).toMatch(/^Spray session booked or moved: Mail booth, \w{3} \d{1,2} \w{3}, \d\d:\d\d–\d\d:\d\d$/);
    expect(mail.text).toContain(`${ctx.config.publicUrl}/spray-sessions/${sessionId}`);
    expect(`${mail.subject} ${mail.text}`).not.toMatch(/GMT|BST|session \d|\d{4}-\d\d-\d\d/);
  });

  it('sends "ready to handle" once the last coat can be handled, not before', async () => {
    // Demo sealer at 20 °C: no latest recoat time, handle after 30 min. Precat clear: recoat 45–1440 min, handle 60 min.
    await coat('Sanding Sealer', at('2027-03-01T08:00:00Z'), 0);
    await coat('Precat Clear', at('2027-03-01T09:00:00Z'), 2);
    const before = runtime.mailbox!.messages.length;
    await runtime.service.tick(new Date(at('2027-03-01T09:30:00Z')));
    expect(runtime.mailbox!.messages.filter((m) => m.subject.startsWith('Ready to handle'))).toHaveLength(0);
    await runtime.service.tick(new Date(at('2027-03-01T10:05:00Z')));
    await waitFor(() => runtime.mailbox!.messages.some((m) => m.subject.startsWith('Ready to handle')));
    const ready = runtime.mailbox!.messages.filter((m) => m.subject.startsWith('Ready to handle'));
    // Assembler and lead both asked for it by default.
    expect(ready.map((m) => m.to).join(' ')).toMatch(/assembler@larchmere.test/);
    expect(ready[0].subject).toContain('LJ-26-102');
    expect(ready[0].text).toContain('Drawer 1 front');
    // Which coat, of what, where and when, and a link to the board.
    expect(ready[0].text).toMatch(/^2 parts of LJ-26-102 \(Morrow & Daughters Cabinetmakers\) can be handled since \w{3} \d{1,2} \w{3}, 10:00, after coat 2 of 2 \(Kestrel Precat Clear Matt\), sprayed in Mail booth on \w{3} \d{1,2} \w{3}, 09:00:/);
    expect(ready[0].text).toMatch(/\/ready\?jobId=\d+\s*$/);
    expect(runtime.mailbox!.messages.length).toBeGreaterThan(before);
  });

  it('still tells someone who asks for "ready to handle" later that day, after the others were told', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    const readyTo = (email: string) => runtime.mailbox!.messages.filter((m) => m.subject.startsWith('Ready to handle') && m.to.includes(email));
    // A second tick with nothing new sends nothing: the coat is decided.
    await runtime.service.tick(new Date(at('2027-03-01T10:06:00Z')));
    expect(readyTo('sprayer@larchmere.test')).toHaveLength(0);
    const me = (await sprayer.agent.get('/api/auth/me').expect(200)).body.user;
    await sprayer.agent.patch('/api/auth/me').set('x-csrf-token', sprayer.csrf).send({ notify: { ...me.notify, 'parts-ready': true } }).expect(200);
    await runtime.service.tick(new Date(at('2027-03-01T10:07:00Z')));
    await waitFor(() => readyTo('sprayer@larchmere.test').length > 0);
    expect(readyTo('sprayer@larchmere.test')[0].subject).toContain('LJ-26-102');
    await sprayer.agent.patch('/api/auth/me').set('x-csrf-token', sprayer.csrf).send({ notify: me.notify }).expect(200);
  });

  it('warns before a recoat window closes while parts still wait for their next coat', async () => {
    // Demo 2K PU primer at 20 °C: the recoat window closes 1440 min after the coat.
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
    const doors = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items.slice(0, 1).map((p: { id: number }) => p.id);
    const productId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
    await lead.agent.post('/api/coats').set('x-csrf-token', lead.csrf).send({ spraySessionId: sessionId, partIds: doors, productId, sprayedAt: at('2027-03-01T11:00:00Z'), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }).expect(201);
    await runtime.service.tick(new Date(at('2027-03-02T09:30:00Z')));
    await waitFor(() => runtime.mailbox!.messages.some((m) => m.subject.startsWith('Recoat window closing')));
    const warning = runtime.mailbox!.messages.find((m) => m.subject.startsWith('Recoat window closing'))!;
    expect(warning.subject).toContain('LJ-26-105');
    expect(warning.text).toContain('they need a denib with P320 first');
    expect(warning.text).toMatch(/after coat 1 of \d \(Kestrel 2K PU Primer White\), sprayed in Mail booth on/);
    expect(warning.text).toContain(`${ctx.config.publicUrl}/jobs/${job.id}`);
  });

  it('sends nothing twice after a restart, and still sends what fell due while it was down', async () => {
    const count = runtime.mailbox!.messages.length;
    const restarted = await startNotifications(ctx.dataSource, { ...ctx.config, fakeSmtpPort: 0, smtpUrl: undefined }, pino({ level: 'silent' }), { schedule: false });
    try {
      // Same instant again: every rule finds the same dedupe keys, so nothing new goes out.
      const again = await restarted.service.tick(new Date(at('2027-03-02T09:30:00Z')));
      expect(again.sent).toBe(0);
      // The 3 March plan fell due at 06:00 while "down"; the 07:30 tick after the restart sends it.
      const morning = await restarted.service.tick(new Date(at('2027-03-03T07:30:00Z')));
      expect(morning.sent).toBeGreaterThan(0);
      await waitFor(() => restarted.mailbox!.messages.some((m) => m.subject.startsWith('Today’s booth plan')));
      expect(restarted.mailbox!.messages.every((m) => !m.subject.startsWith('Ready to handle'))).toBe(true);
    } finally {
      await restarted.stop();
    }
    expect(runtime.mailbox!.messages.length).toBe(count);
  });
});
