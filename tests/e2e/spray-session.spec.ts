import { expect, request, test, type APIRequestContext, type Locator, type Page } from '@playwright/test';
import type { Coat } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import type { SpraySession } from '../../shared/schemas/spray-session';
import { demo, demoPassword, signIn } from './helpers';

const shopZone = 'Europe/London';
const clock = (iso: string) => new Intl.DateTimeFormat('en-GB', { timeZone: shopZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

interface Api {
  context: APIRequestContext;
  get: <T>(path: string) => Promise<T>;
  send: <T>(method: 'POST' | 'PATCH', path: string, body: object) => Promise<T>;
}

/** The finishing lead's own API session, to set up what the sprayer then works on. */
async function leadApi(baseURL: string): Promise<Api> {
  const context = await request.newContext({ baseURL });
  const token = async () => (await (await context.get('/api/auth/csrf')).json()).token as string;
  const login = await context.post('/api/auth/login', { headers: { 'x-csrf-token': await token() }, data: { email: demo.lead.email, password: demoPassword } });
  expect(login.ok()).toBe(true);
  const csrf = await token();
  const get = async <T>(path: string): Promise<T> => {
    const res = await context.get(path);
    expect(res.ok(), `GET ${path}`).toBe(true);
    return res.json();
  };
  const send = async <T>(method: 'POST' | 'PATCH', path: string, body: object): Promise<T> => {
    const res = await context.fetch(path, { method, headers: { 'x-csrf-token': csrf }, data: body });
    expect(res.ok(), `${method} ${path}: ${await res.text()}`).toBe(true);
    return res.json();
  };
  return { context, get, send };
}

/** A fresh door on the demo vanity job (2K PU primer first) in a session booked now for Mina, the demo sprayer. */
async function bookSession(api: Api): Promise<{ sessionId: number; partLabel: string; partTag: string }> {
  const now = Date.now();
  const job = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const partLabel = `E2E door ${now}`;
  const { part } = await api.send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, { label: partLabel, lengthMm: 715, widthMm: 496, thicknessMm: 18 });
  // Earlier runs on the same database may have left the sprayer or the booth booked now.
  const around = { from: new Date(now - 3 * 3_600_000).toISOString(), to: new Date(now + 3 * 3_600_000).toISOString() };
  const { items } = await api.get<List<SpraySession>>(`/api/spray-sessions?from=${encodeURIComponent(around.from)}&to=${encodeURIComponent(around.to)}`);
  for (const old of items) if (old.state !== 'cancelled' && (old.sprayerId === 3 || old.boothId === 1)) await api.send('PATCH', `/api/spray-sessions/${old.id}`, { state: 'cancelled' });
  const { spraySession } = await api.send<{ spraySession: SpraySession }>('POST', '/api/spray-sessions', {
    boothId: 1,
    start: new Date(now - 5 * 60_000).toISOString(),
    end: new Date(now + 2 * 3_600_000).toISOString(),
    sprayerId: 3,
    items: [{ partId: part.id, stepPosition: 0 }],
    override: { reason: 'Browser test: booked whatever the hour' },
  });
  return { sessionId: spraySession.id, partLabel, partTag: part.tag };
}

/** A number box by its label; the − and + buttons beside it name the field too. */
const box = (scope: Page | Locator, label: string) => scope.getByRole('textbox', { name: new RegExp(`^${label}`) });

async function fillChecklist(page: Page, mask: RegExp) {
  for (const check of [/Extraction is running/, /Filters checked/, /Respirator fitted/]) await page.getByRole('switch', { name: check }).click();
  await box(page, 'Face velocity measured').fill('0.55');
  await page.getByRole('radio', { name: mask }).check();
  await box(page, 'Air temperature').fill('20');
  await box(page, 'Relative humidity').fill('50');
  await box(page, 'Surface temperature').fill('19');
}

test.describe('spray session', () => {
  test('a sprayer checks, mixes, records coats on and off line, stops spraying, and corrects a coat in the log', async ({ page, context, baseURL }) => {
    test.setTimeout(120_000);
    const api = await leadApi(baseURL!);
    const { sessionId, partLabel, partTag } = await bookSession(api);

    await signIn(page, 'sprayer', `/spray-sessions/${sessionId}`);
    await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
    const cautions = page.getByRole('region', { name: /Safety cautions/ });
    await expect(cautions).toContainText('Kestrel 2K PU Primer White');
    await expect(cautions).toContainText('Air-fed respiratory protection');
    await expect(cautions).toContainText('Follow each product’s safety data sheet, your local regulations and the advice of a competent person');

    // The wrong mask for an isocyanate primer: stop, and spraying cannot start.
    await fillChecklist(page, /vapour and particulate filters/);
    await expect(page.getByText('Stop: do not spray')).toBeVisible();
    await expect(page.getByText('The products need air fed protection, more than vapour and particulate.')).toBeVisible();
    await expect(page.getByText(/Dew point\s*9\.3 °C/)).toBeVisible();
    const start = page.getByRole('button', { name: 'Start spraying' });
    await expect(start).toBeDisabled();
    await expect(page.getByText(/The checks say stop\. Put right what is listed above/)).toBeVisible();

    await page.getByRole('radio', { name: /Air-fed hood or visor/ }).check();
    await expect(page.getByText('Go: fit to spray')).toBeVisible();
    await expect(start).toBeEnabled();
    await start.click();
    await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
    await expect(page.getByText(/Checks recorded .* by Mina Castell/)).toBeVisible();

    // A 3 L pot of the 2 : 1 primer with 10 % thinner.
    await page.getByRole('button', { name: 'Record a mix' }).click();
    await box(page, 'Amount to mix').fill('3');
    await expect(box(page, 'Thinner')).toHaveValue('10');
    await expect(page.getByText('Pour 1.82 L base, 0.91 L hardener and 0.27 L thinner: 3.00 L in all.')).toBeVisible();
    await page.getByRole('button', { name: 'Record mix' }).click();
    const mix = page.getByRole('article', { name: /^Mix \d+: Kestrel 2K PU Primer White/ });
    await expect(mix).toContainText('Base1.82 L');
    await expect(mix).toContainText('Hardener0.91 L');
    await expect(mix).toContainText('Thinner0.27 L');
    await expect(mix).toContainText(/Usable until \d{2}:\d{2}/);

    // The first coat: the planned door, its planned primer step, the new pot.
    const coatForm = page.getByRole('region', { name: 'Record a coat' });
    await expect(coatForm.getByRole('button', { name: `Remove ${partLabel}` })).toBeVisible();
    await expect(coatForm.getByLabel('Step')).toHaveValue('0');
    // A typed tag code: an unknown one is refused in words, the door's own is found (and not added twice).
    await coatForm.getByRole('button', { name: 'Scan or type a tag' }).click();
    await coatForm.getByRole('textbox', { name: 'Tag code' }).fill('zzzz 2222');
    await coatForm.getByRole('button', { name: 'Add part' }).click();
    await expect(coatForm.getByText('No part has the tag ZZZZ2222. Check the code and try again.')).toBeVisible();
    await coatForm.getByRole('textbox', { name: 'Tag code' }).fill(partTag.toLowerCase());
    await coatForm.getByRole('textbox', { name: 'Tag code' }).press('Enter');
    await expect(coatForm.getByText(`${partLabel} (tag ${partTag}) is added.`)).toBeVisible();
    await expect(coatForm.getByRole('list', { name: 'Chosen parts' }).getByRole('listitem')).toHaveCount(1);
    await box(coatForm, 'Wet film reading').fill('140');
    // 140 µm wet × 45 % solids / (100 + 10 % thinner) = 57 µm dry, within 20 % of the 60 µm target.
    await expect(coatForm.getByText(/Dry film\s*57 µm\s*against a target of 60 µm/)).toBeVisible();
    await expect(coatForm.getByText('On target')).toBeVisible();
    await coatForm.getByRole('button', { name: 'Record coat' }).click();
    await expect(page.getByRole('article', { name: /^Coat \d+$/ })).toHaveCount(1);
    const [first] = (await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`)).items;
    const latest = page.getByRole('article', { name: `Coat ${first.id}` });
    await expect(latest).toContainText('dry film 57 µm');
    await expect(latest.getByText('Handle from').locator('..')).toContainText(clock(first.handleAt));
    await expect(latest).toContainText(/Flash-off until \d{2}:\d{2}/);
    await expect(latest).toContainText(`Next on ${partLabel}: Abrade P320`);

    // No connection: the second coat waits on the tablet with its idempotency key.
    await context.setOffline(true);
    await box(coatForm, 'Wet film reading').fill('150');
    await expect(coatForm.getByText(/not ready to recoat until/)).toBeVisible();
    await coatForm.getByLabel('Why this coat goes on anyway').fill('Second pass on the edges while the first is wet');
    await coatForm.getByRole('button', { name: 'Record coat' }).click();
    await expect(page.getByText('Pending — not yet on the server')).toBeVisible();
    expect((await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`)).total).toBe(1);

    await context.setOffline(false);
    await expect(page.getByText('Pending — not yet on the server')).toBeHidden({ timeout: 20_000 });
    await expect(page.getByRole('article', { name: /^Coat \d+$/ })).toHaveCount(2);
    const sent = await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`);
    expect(sent.total).toBe(2);
    expect(sent.items[0].warnings).toContainEqual(expect.objectContaining({ code: 'recoat-too-soon', acknowledgedReason: 'Second pass on the edges while the first is wet' }));

    // Spraying stops: the clearance countdown, and the caution to stay protected.
    await page.getByRole('button', { name: 'Spraying stopped' }).click();
    await page.getByRole('button', { name: 'Yes, spraying has stopped' }).click();
    await expect(page.getByRole('heading', { name: 'Clearing the air' })).toBeVisible();
    await expect(page.getByText(/Keep everyone else out of Booth 1 \(cross-draft\) until the countdown ends/)).toBeVisible();
    await expect(page.getByText(/^Clearance: \d+ minutes? left$/)).toBeAttached();
    await expect(page.getByRole('button', { name: 'Done' })).toBeDisabled();

    // The coat log: both coats; a correction with its reason keeps the first version in the history.
    await page.goto('/coat-log');
    await expect(page.getByRole('row', { name: `Coat ${first.id}` })).toContainText(/140 µm wet\s*57 µm dry/);
    await expect(page.getByRole('row', { name: `Coat ${sent.items[0].id}` })).toContainText('Reason: Second pass on the edges while the first is wet');
    await page.getByRole('button', { name: `Correct coat ${first.id}` }).click();
    const dialog = page.getByRole('dialog', { name: `Correct coat ${first.id}` });
    await dialog.getByRole('button', { name: 'Save correction' }).click();
    await expect(dialog.getByText('Say what was wrong')).toBeVisible();
    await dialog.getByLabel('Wet film').fill('130');
    await dialog.getByLabel('Reason for the correction').fill('Comb was read on the edge, not the face');
    await dialog.getByRole('button', { name: 'Save correction' }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByRole('row', { name: `Coat ${first.id}`, exact: true })).toBeHidden();

    // The filters live in the address; the box shows ticked once the router has moved.
    await page.getByRole('checkbox', { name: 'Show history' }).click();
    await expect(page.getByRole('checkbox', { name: 'Show history' })).toBeChecked();
    await expect(page).toHaveURL(/history=true/);
    const replaced = page.getByRole('row', { name: `Coat ${first.id}, replaced` });
    const { items: history } = await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}&history=true`);
    const correction = history.find((c) => c.replacesId === first.id)!;
    await expect(replaced).toContainText(`Corrected by #${correction.id}`);
    await expect(page.getByRole('row', { name: `Coat ${correction.id}` })).toContainText('Why: Comb was read on the edge, not the face');
    await expect(page.getByRole('row', { name: `Coat ${correction.id}` })).toContainText(/130 µm wet\s*53 µm dry/);
    await api.context.dispose();
  });

  test('a finishing lead may start over a stop only with a reason, which is recorded with the checks', async ({ page, baseURL }) => {
    const api = await leadApi(baseURL!);
    const { sessionId } = await bookSession(api);
    await signIn(page, 'lead', `/spray-sessions/${sessionId}`);
    await fillChecklist(page, /Air-fed hood or visor/);
    await box(page, 'Relative humidity').fill('90');
    await expect(page.getByText('Stop: do not spray')).toBeVisible();
    await expect(page.getByText(/Humidity 90 % is above this product's maximum of 80 %/)).toBeVisible();
    const start = page.getByRole('button', { name: 'Start spraying' });
    await expect(start).toBeDisabled();
    await page.getByLabel('Lead’s reason to spray despite the stop').fill('Dehumidifier running; sealer coat only');
    await expect(start).toBeEnabled();
    await start.click();
    await expect(page.getByText('Lead’s override: Dehumidifier running; sealer coat only')).toBeVisible();
    await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
    await api.context.dispose();
  });
});
