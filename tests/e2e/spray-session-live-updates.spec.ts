import { request, type Browser, type Page } from '@playwright/test';
import type { Coat } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import { fillPreSprayChecks } from './booth-steps';
import { expect, shotsDir, test } from './fixtures';
import { demo, demoPassword, signIn, type DemoRole } from './helpers';
import { bookSprayerNow } from './lead-api';

/** The lead's API session, only to set the stage: a new job's door on a rack and a session booked now for the sprayer. */
async function setStage(baseURL: string) {
  const api = await request.newContext({ baseURL });
  const token = async () => (await (await api.get('/api/auth/csrf')).json()).token as string;
  expect(
    (
      await api.post('/api/auth/login', {
        headers: { 'x-csrf-token': await token() },
        data: { email: demo.lead.email, password: demoPassword },
      })
    ).ok(),
  ).toBe(true);
  const csrf = await token();
  const send = async <T>(method: 'POST' | 'PATCH', path: string, data: object): Promise<T> => {
    const res = await api.fetch(path, { method, headers: { 'x-csrf-token': csrf }, data });
    expect(res.ok(), `${method} ${path}: ${await res.text()}`).toBe(true);
    return (await res.json()) as T;
  };
  const get = async <T>(path: string): Promise<T> => (await (await api.get(path)).json()) as T;
  const now = Date.now();
  // A job of its own on the vanity job's finish system (2K PU primer first), so no other test's part counts change.
  const vanity = (await get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const { job } = await send<{ job: Job }>('POST', '/api/jobs', {
    customer: 'Live Test Joinery',
    reference: `LIVE-${now}`,
    dueDate: '2027-06-30',
    finishSystemId: vanity.finishSystemId,
  });
  const { part } = await send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, {
    label: `Live door ${now}`,
    lengthMm: 715,
    widthMm: 496,
    thicknessMm: 18,
    rackId: 1,
    shelf: 5,
  });
  const booked = await bookSprayerNow(
    { context: api, csrf, get, send },
    [{ partId: part.id, stepPosition: 0 }],
    'Browser test of live updates',
  );
  return {
    api,
    job,
    part,
    sessionId: booked.id,
    cancel: booked.cancel,
    coatsOf: () => get<List<Coat>>(`/api/coats?spraySessionId=${booked.id}`),
  };
}

/** Another person's browser: the fixtures watch its pages as they do the test's own (a console error, page error or 5xx fails the test). */
async function personAt(browser: Browser, role: DemoRole, path: string): Promise<Page> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const streamOpen = page.waitForResponse((r) => r.url().endsWith('/api/events') && r.ok());
  await signIn(page, role, path);
  await streamOpen;
  // A marker on the window: a reload would lose it.
  await page.evaluate(() => Object.assign(window, { notReloaded: true }));
  return page;
}

const notReloaded = (page: Page) =>
  page.evaluate(() => (window as unknown as { notReloaded?: boolean }).notReloaded === true);

test('a coat logged on the sprayer’s tablet shows on the lead’s open coat log and the assembler’s ready board without a reload', async ({
  page,
  browser,
  baseURL,
}) => {
  test.setTimeout(120_000);
  const stage = await setStage(baseURL!);
  try {
    const lead = await personAt(browser, 'lead', `/coat-log?job=${stage.job.id}`);
    await expect(lead.getByRole('heading', { name: 'Coat log', level: 1 })).toBeVisible();
    const assembler = await personAt(browser, 'assembler', `/ready?job=${stage.job.id}`);
    const card = assembler.getByRole('listitem', { name: new RegExp(`^${stage.part.label}, `) });
    await expect(card).toContainText('Waiting for finish');
    await expect(card).toContainText('No coats yet (3 to go)');

    // The sprayer runs the session on the tablet: the checks, then the planned door's primer coat.
    await signIn(page, 'sprayer', `/spray-sessions/${stage.sessionId}`);
    await fillPreSprayChecks(page);
    await page.getByRole('button', { name: 'Start spraying' }).click();
    const coatForm = page.getByRole('region', { name: 'Record a coat' });
    await expect(coatForm.getByRole('button', { name: `Remove ${stage.part.label}` })).toBeVisible();
    await coatForm.getByRole('textbox', { name: /^Wet film reading/ }).fill('140');
    await coatForm.getByRole('button', { name: 'Record coat' }).click();
    await expect(page.getByRole('article', { name: /^Coat \d+ of \d+, / })).toHaveCount(1);
    const [coat] = (await stage.coatsOf()).items;

    // The lead's coat log and the assembler's board follow the change stream; neither reloads.
    const row = lead.getByRole('row', {
      name: `${coat.partLabels.join(' and ')}, ${coat.jobReference}, coat 1 of 3`,
      exact: false,
    });
    await expect(row).toBeVisible({ timeout: 5_000 });
    await expect(row).toContainText('Kestrel 2K PU Primer White');
    await expect(row).toContainText('Mina Castell');
    await expect(card).toContainText('1 of 3 coats on', { timeout: 5_000 });
    await expect(card).toContainText('In finish');
    expect(await notReloaded(lead)).toBe(true);
    expect(await notReloaded(assembler)).toBe(true);
    await lead.screenshot({ path: `${shotsDir}/live-coat-log.png`, fullPage: true });
    await assembler.screenshot({ path: `${shotsDir}/live-ready-board.png`, fullPage: true });

    await lead.context().close();
    await assembler.context().close();
  } finally {
    await stage.cancel();
    await stage.api.dispose();
  }
});
