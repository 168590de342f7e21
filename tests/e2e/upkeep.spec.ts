import { request, type APIRequestContext, type Page } from '@playwright/test';
import { fillPreSprayChecks } from './booth-steps';
import { clearSpan, leadApi } from './lead-api';
import { expect, test } from './fixtures';
import { demo, demoPassword, mainNav, signIn } from './helpers';

/**
 * Fails the test on any page error or console error. Chromium also logs each 4xx answer as
 * "Failed to load resource"; those are the API's refusals (the signed-out probe before sign-in,
 * the lead refused someone's records), which the screens put in words, so they are let through.
 */
function watchConsole(page: Page): string[] {
  const problems: string[] = [];
  const refusal = /^Failed to load resource: the server responded with a status of 4\d\d/;
  page.on('console', (message) => {
    if (message.type() === 'error' && !refusal.test(message.text())) problems.push(`console error: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('response', (response) => {
    if (response.status() >= 500) problems.push(`${response.status()} from ${response.url()}`);
  });
  return problems;
}

interface Api {
  context: APIRequestContext;
  send: <T>(method: 'GET' | 'POST' | 'PATCH', path: string, body?: object) => Promise<T>;
}

async function apiAs(baseURL: string, email: string): Promise<Api> {
  const context = await request.newContext({ baseURL });
  const token = async () => (await (await context.get('/api/auth/csrf')).json()).token as string;
  expect((await context.post('/api/auth/login', { headers: { 'x-csrf-token': await token() }, data: { email, password: demoPassword } })).ok()).toBe(true);
  const csrf = await token();
  const send = async <T>(method: 'GET' | 'POST' | 'PATCH', path: string, body?: object): Promise<T> => {
    const res = await context.fetch(path, { method, headers: { 'x-csrf-token': csrf }, data: body });
    expect(res.ok(), `${method} ${path}: ${await res.text()}`).toBe(true);
    return res.json();
  };
  return { context, send };
}

const shopDate = (daysFromNow: number) => new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London' }).format(new Date(Date.now() + daysFromNow * 86_400_000));

test.describe('booth upkeep and crew records', () => {
  test('a lead logs a filter change and records an extraction test', async ({ page }) => {
    const problems = watchConsole(page);
    await signIn(page, 'lead');
    await mainNav(page).getByRole('link', { name: 'Booth upkeep' }).click();
    await expect(page.getByRole('heading', { name: 'Booth upkeep', level: 1 })).toBeVisible();
    await expect(page.getByText(/Follow your local regulations and the booth maker’s instructions/)).toBeVisible();
    await page.getByLabel('Booth', { exact: true }).selectOption({ label: 'Booth 1 (cross-draft)' });

    // The demo's arrestor pads read 214 of 250 Pa: near their limit.
    const pads = page.getByRole('listitem', { name: 'Filter bank Arrestor pads, back wall' });
    await expect(pads).toContainText('Near its limit');
    await pads.getByRole('button', { name: 'Log a filter change for Arrestor pads, back wall' }).click();
    const change = page.getByRole('dialog', { name: /Log a filter change/ });
    await expect(change.getByLabel(/Gauge before/)).toHaveValue('214');
    await change.getByLabel(/Gauge after/).fill('52');
    await change.getByLabel('Notes').fill('Pads replaced, left side heaviest');
    await change.getByRole('button', { name: 'Log filter change' }).click();
    await expect(change).toBeHidden();
    await expect(pads).toContainText('Within limit');
    await expect(pads).toContainText('Gauge 52 Pa of 250 Pa change-at');
    await expect(page.getByRole('region', { name: 'Recent record' })).toContainText('Arrestor pads, back wall: filters changed (214 Pa → 52 Pa). Pads replaced, left side heaviest');

    await page.getByRole('button', { name: 'Record extraction test' }).click();
    const test = page.getByRole('dialog', { name: 'Record an extraction test' });
    await test.getByLabel('Tested by').fill('Fellgate Airflow Testing');
    for (const [index, value] of ['0.52', '0.48', '0.55', '0.45'].entries()) await test.getByLabel(`Point ${index + 1}`, { exact: true }).fill(value);
    // (0.52 + 0.48 + 0.55 + 0.45) / 4 = 0.50 m/s against booth 1's minimum of 0.50 m/s.
    await expect(test.getByRole('status')).toHaveText('Mean of 4 readings: 0.50 m/s — meets the booth’s minimum of 0.50 m/s');
    await test.getByRole('button', { name: 'Add a point' }).click();
    await test.getByLabel('Point 5', { exact: true }).fill('0.30');
    await expect(test.getByRole('status')).toContainText('0.46 m/s — below');
    await test.getByRole('button', { name: 'Remove the last point' }).click();
    await test.getByLabel(/Clearance time measured/).fill('3.5');
    await test.getByRole('button', { name: 'Record extraction test' }).click();
    await expect(test).toBeHidden();
    const panel = page.getByRole('region', { name: 'Extraction test' });
    await expect(panel).toContainText('0.50 m/s over 4 points (meets the minimum of 0.50 m/s)');
    await expect(panel).toContainText('Fellgate Airflow Testing');
    await expect(panel).toContainText('Valid');
    expect(problems).toEqual([]);
  });

  test('a lead reads upkeep done against due in the reports', async ({ page }) => {
    const problems = watchConsole(page);
    await signIn(page, 'lead');
    await mainNav(page).getByRole('link', { name: 'Reports', exact: true }).click();
    await page.getByRole('button', { name: 'Last 12 months' }).click();
    await page.getByRole('tab', { name: 'Upkeep' }).click();
    await expect(page).toHaveURL(/report=upkeep/);
    const table = page.getByRole('table', { name: /^Upkeep done in the range and upkeep that fell due/ });
    // The demo shop changed booth 1's arrestor pads and tested its extraction within the year.
    const extraction = table.getByRole('row', { name: /Booth 1 \(cross-draft\) Extraction tests/ });
    // Cells after the booth (a row header): the upkeep, then what was done in the range.
    await expect(extraction.getByRole('cell').nth(1)).not.toHaveText('0');
    await expect(table.getByRole('row', { name: /Crew \(all people\) Face-fit tests/ })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Download CSV' })).toHaveAttribute('href', /^\/api\/reports\/upkeep\?from=/);
    expect(problems).toEqual([]);
  });

  test('a sprayer sees their own fit test in full', async ({ page }) => {
    const problems = watchConsole(page);
    await signIn(page, 'sprayer');
    await mainNav(page).getByRole('link', { name: 'Crew records' }).click();
    await expect(page.getByRole('heading', { name: 'My crew records' })).toBeVisible();
    const fitTest = page.getByRole('region', { name: 'Respirator face-fit test' });
    await expect(fitTest).toContainText('Ostrel HM-200 half mask, A2P3, size M — pass');
    await expect(fitTest).toContainText('Due soon');
    await expect(fitTest).toContainText(/Next due \d{1,2} \w{3} \d{4}/);
    expect(problems).toEqual([]);
  });

  test('a lead sees each person’s status only, and is refused the details', async ({ page }) => {
    const problems = watchConsole(page);
    await signIn(page, 'lead');
    await mainNav(page).getByRole('link', { name: 'Crew records' }).click();
    const mina = page.getByRole('row', { name: /Mina Castell/ });
    await expect(mina.getByRole('cell', { name: 'Face-fit test: Due soon' })).toBeVisible();
    await expect(mina.getByRole('cell', { name: 'Health surveillance: Valid' })).toBeVisible();
    await expect(mina.getByRole('link')).toHaveCount(0);
    await expect(page.getByText(/Ostrel|A2P3|\d{4}-\d{2}-\d{2}/)).toHaveCount(0);
    const minaId = (await (await page.request.get('/api/crew')).json()).items.find((p: { name: string }) => p.name === 'Mina Castell').userId;
    await page.goto(`/crew/${minaId}`);
    await expect(page.getByText('Could not load the records.')).toBeVisible();
    await expect(page.getByText(/Only the person themself and the owner see these records/)).toBeVisible();
    expect(problems).toEqual([]);
  });

  test('a sprayer adds a photo of a defect to a coat from the coat log and opens it full size', async ({ page }) => {
    const problems = watchConsole(page);
    await signIn(page, 'sprayer');
    await mainNav(page).getByRole('link', { name: 'Coat log' }).click();
    // A coat is named by its product and when it was sprayed, never by a record number.
    const addButton = page.getByRole('button', { name: /^Add a photo to the .+ coat sprayed \w{3} \d{1,2} \w{3}, \d{2}:\d{2}$/ }).first();
    const coatName = (await addButton.getAttribute('aria-label'))!.replace('Add a photo to ', '');
    await addButton.click();
    const dialog = page.getByRole('dialog', { name: `Add a photo to ${coatName}` });
    await expect(dialog.getByLabel('Photo')).toHaveAttribute('capture', 'environment');
    await expect(dialog.getByLabel('Photo')).toHaveAttribute('accept', 'image/*');
    await dialog.getByRole('button', { name: 'Add photo' }).click();
    await expect(dialog.getByText('Take or choose a photo.')).toBeVisible();
    const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');
    await dialog.getByLabel('Photo').setInputFiles({ name: 'defect.png', mimeType: 'image/png', buffer: png });
    await expect(dialog.getByRole('img', { name: 'The photo chosen' })).toBeVisible();
    await dialog.getByLabel('It shows').selectOption({ label: 'A defect' });
    await dialog.getByLabel('Caption').fill('Dust nib, top rail');
    await dialog.getByRole('button', { name: 'Add photo' }).click();
    await expect(dialog).toBeHidden();
    const thumbnail = page.getByRole('button', { name: 'Open photo: A defect, Dust nib, top rail' });
    await expect(thumbnail).toBeVisible();
    await thumbnail.click();
    const viewer = page.getByRole('dialog', { name: `Photo of ${coatName}` });
    await expect(viewer.getByRole('img', { name: 'A defect on this coat: Dust nib, top rail' })).toBeVisible();
    await expect(viewer.getByRole('link', { name: 'Open full size' })).toHaveAttribute('href', /^\/api\/coat-photos\/\d+$/);
    await expect(viewer).toContainText('Mina Castell');
    expect(problems).toEqual([]);
  });

  test('the pre-spray checks stop on a lapsed fit test, and a lead overrides with a reason', async ({ page, baseURL }) => {
    const problems = watchConsole(page);
    const admin = await apiAs(baseURL!, demo.admin.email);
    const lead = await apiAs(baseURL!, demo.lead.email);
    const stamp = Date.now();
    const { user } = await admin.send<{ user: { id: number } }>('POST', '/api/users', { email: `pell.${stamp}@larchmere.test`, name: 'Pell Armitage', role: 'sprayer', password: 'Spray-booth-Larchmere-77' });
    // Fit-tested 13 months ago on the shop's yearly interval: lapsed a month ago.
    await admin.send('POST', `/api/crew/${user.id}/records`, { kind: 'fit-test', doneOn: shopDate(-396), respiratorModel: 'Ostrel HM-200 half mask, size M', result: 'pass' });
    // A drawer box of the clear oak job: its first coat is the solvent-borne sanding sealer, worn with a tight-fitting filter mask.
    const job = (await lead.send<{ items: { id: number }[] }>('GET', '/api/jobs?q=LJ-26-102')).items[0];
    const { part } = await lead.send<{ part: { id: number } }>('POST', `/api/jobs/${job.id}/parts`, { label: `Upkeep box ${stamp}`, lengthMm: 500, widthMm: 400, thicknessMm: 15 });
    const start = new Date(stamp - 5 * 60_000).toISOString();
    const end = new Date(stamp + 2 * 3_600_000).toISOString();
    // The demo week may have booth 2 booked then (running, or just done when the shop was seeded).
    const room = await leadApi(baseURL!);
    await clearSpan(room, { start, end }, { boothIds: [2], sprayerId: user.id });
    await room.context.dispose();
    const { spraySession } = await lead.send<{ spraySession: { id: number } }>('POST', '/api/spray-sessions', { boothId: 2, start, end, sprayerId: user.id, items: [{ partId: part.id, stepPosition: 0 }], override: { reason: 'Browser test: booked whatever the hour' } });

    await signIn(page, 'lead', `/spray-sessions/${spraySession.id}`);
    await fillPreSprayChecks(page, /vapour and particulate filters/);

    const fitness = page.getByRole('region', { name: 'Fit to spray' });
    await expect(fitness).toContainText('Not fit to spray');
    await expect(fitness).toContainText('The sprayer’s face-fit test has lapsed.');
    await expect(fitness).toContainText('A tight-fitting facepiece must be fit-tested to its wearer');
    await expect(page.getByText('Stop: do not spray')).toBeVisible();
    const startButton = page.getByRole('button', { name: 'Start spraying' });
    await expect(startButton).toBeDisabled();

    // With an air-fed hood the lapsed fit test is only a caution; back to the filter mask for the override.
    await page.getByRole('radio', { name: /Air-fed hood or visor/ }).check();
    await expect(fitness).toContainText('applies only to a tight-fitting facepiece, if one is worn');
    await expect(page.getByText('Stop: do not spray')).toBeHidden();
    await page.getByRole('radio', { name: /vapour and particulate filters/ }).check();
    await expect(page.getByText('Stop: do not spray')).toBeVisible();

    await page.getByLabel('Lead’s reason to spray despite the stop').fill('Fit test booked for Monday; Pell sprays this sealer coat under supervision');
    await expect(startButton).toBeEnabled();
    await startButton.click();
    await expect(page.getByText('Lead’s override: Fit test booked for Monday; Pell sprays this sealer coat under supervision')).toBeVisible();
    await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
    await Promise.all([admin.context.dispose(), lead.context.dispose()]);
    expect(problems).toEqual([]);
  });
});
