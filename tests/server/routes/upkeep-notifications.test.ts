import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startNotifications, type NotificationRuntime } from '../../../server/mail/notifications-runtime';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let runtime: NotificationRuntime;
let lead: SignedIn;
let sprayer: SignedIn;

const waitFor = async (check: () => boolean) => {
  for (let i = 0; i < 50 && !check(); i++) await new Promise((r) => setTimeout(r, 50));
};
const mails = (to: string, subject: RegExp) => runtime.mailbox!.messages.filter((m) => m.to.includes(to) && subject.test(m.subject));

beforeAll(async () => {
  ctx = await startTestApp();
  runtime = await startNotifications(ctx.dataSource, { ...ctx.config, fakeSmtpPort: 0, smtpUrl: undefined }, pino({ level: 'silent' }), { schedule: false });
  [lead, sprayer] = await Promise.all([signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer)]);
});
afterAll(async () => {
  await runtime.stop();
  await ctx.close();
});

describe('due-soon e-mails', () => {
  it('tells the lead once that booth 1’s arrestor pads near their limit and the spray room’s extraction test falls due', async () => {
    // The demo shop, seeded now: pads at 214 of 250 Pa; the spray room tested 13 months and a week ago on a 14-month interval.
    await runtime.service.tick(new Date());
    await waitFor(() => mails('lead@larchmere.test', /Booth upkeep/).length >= 2);
    const subjects = mails('lead@larchmere.test', /Booth upkeep/).map((m) => m.subject);
    expect(subjects).toEqual(expect.arrayContaining(['Booth upkeep: Booth 1 (cross-draft), filter near limit', 'Booth upkeep: Back spray room, extraction test due soon']));
    const extraction = mails('lead@larchmere.test', /extraction test due soon/)[0];
    // A date in the shop's locale (en-GB), never ISO; and a link to the upkeep page.
    expect(extraction.text).toMatch(/Due on \w{3}, \d{1,2} \w{3} \d{4}\./);
    expect(extraction.text).toContain(`${ctx.config.publicUrl}/upkeep`);
    expect(extraction.text).toContain('Follow your local regulations');
    // The sprayer did not ask for upkeep e-mails (their default), and a second tick sends nothing again.
    expect(mails('sprayer@larchmere.test', /Booth upkeep/)).toEqual([]);
    const count = runtime.mailbox!.messages.length;
    await runtime.service.tick(new Date());
    await new Promise((r) => setTimeout(r, 200));
    expect(runtime.mailbox!.messages.length).toBe(count);
  });

  it('tells the sprayer their own fit test is due with its date, and the lead only that it is due', async () => {
    const own = mails('sprayer@larchmere.test', /Your records/);
    expect(own.map((m) => m.subject)).toEqual(['Your records: The face-fit test is due soon.']);
    expect(own[0].text).toMatch(/Your face-fit test is due soon\. It is due on \w{3}, \d{1,2} \w{3} \d{4}\./);
    const forLead = mails('lead@larchmere.test', /Crew records: Mina Castell/);
    expect(forLead).toHaveLength(1);
    expect(forLead[0].text.trim()).toBe(`Mina Castell: their face-fit test is due soon.\n\nCrew records: ${ctx.config.publicUrl}/crew`);
  });

  it('sends nothing to someone who turned the e-mail off', async () => {
    const me = (await sprayer.agent.get('/api/auth/me').expect(200)).body.user;
    await sprayer.agent.patch('/api/auth/me').set('x-csrf-token', sprayer.csrf).send({ notify: { ...me.notify, 'crew-due': false } }).expect(200);
    const bankId = (await lead.agent.get('/api/booths/1/upkeep').expect(200)).body.upkeep.banks[0].id;
    const before = mails('sprayer@larchmere.test', /./).length;
    await lead.agent.post('/api/readings/filter-gauge').set('x-csrf-token', lead.csrf).send({ filterBankId: bankId, pressureDropPa: 400 }).expect(201);
    await runtime.service.tick(new Date());
    await waitFor(() => mails('lead@larchmere.test', /filter over limit/).length > 0);
    expect(mails('lead@larchmere.test', /filter over limit/)).toHaveLength(1);
    expect(mails('sprayer@larchmere.test', /./).length).toBe(before);
  });
});
