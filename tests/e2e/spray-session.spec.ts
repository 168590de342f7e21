import type { Page } from '@playwright/test';
import type { Coat } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import { box, fillPreSprayChecks } from './booth-steps';
import { expect, shotsDir, test } from './fixtures';
import { shopTimePattern, signIn } from './helpers';
import { bookSprayerNow, leadApi, type LeadApi } from './lead-api';

const shopZone = 'Europe/London';
const clock = (iso: string) => new Intl.DateTimeFormat('en-GB', { timeZone: shopZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

/** A fresh door on the demo vanity job (2K PU primer first) in a session booked now for Mina, the demo sprayer. */
async function bookSession(api: LeadApi): Promise<{ sessionId: number; cancel: () => Promise<void>; partLabel: string; partTag: string }> {
  const now = Date.now();
  const job = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const partLabel = `E2E door ${now}`;
  const { part } = await api.send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, { label: partLabel, lengthMm: 715, widthMm: 496, thicknessMm: 18 });
  const booked = await bookSprayerNow(api, [{ partId: part.id, stepPosition: 0 }]);
  return { sessionId: booked.id, cancel: booked.cancel, partLabel, partTag: part.tag };
}

/** A coat log row is named by its parts, job, coat and time: "Door 1 and Door 2, LJ-26-105, coat 1 of 3, Sat 5 Dec, 10:40". */
const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const coatRows = (page: Page, parts: string, coat: string) => page.getByRole('row', { name: new RegExp(`^${escaped(parts)}, LJ-26-105, ${coat}, `) });


test.describe('spray session', () => {
  // Taking the tablet off line makes the browser report the requests it could not send.
  test.use({ expectedConsoleError: /net::ERR_INTERNET_DISCONNECTED|net::ERR_NETWORK_CHANGED/ });

  test('a sprayer checks, mixes, records coats on and off line, stops spraying, and corrects a coat in the log', async ({ page, context, baseURL }) => {
    test.setTimeout(120_000);
    const api = await leadApi(baseURL!);
    const { sessionId, partLabel, partTag, cancel } = await bookSession(api);
    try {

      await signIn(page, 'sprayer', `/spray-sessions/${sessionId}`);
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      const cautions = page.getByRole('region', { name: /Safety cautions/ });
      await expect(cautions).toContainText('Kestrel 2K PU Primer White');
      await expect(cautions).toContainText('Air-fed respiratory protection');
      await expect(cautions).toContainText('Follow each product’s safety data sheet, your local regulations and the advice of a competent person');

      // The wrong mask for an isocyanate primer: stop, and spraying cannot start.
      await fillPreSprayChecks(page, /vapour and particulate filters/);
      await expect(page.getByText('Stop: do not spray')).toBeVisible();
      await expect(page.getByText('These products need air-fed protection; a respirator with vapour and particulate filters is not enough.')).toBeVisible();
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
      const mix = page.getByRole('article', { name: /^Mix: Kestrel 2K PU Primer White mixed at \d{2}:\d{2}$/ });
      await expect(mix).toContainText('Base1.82 L');
      await expect(mix).toContainText('Hardener0.91 L');
      await expect(mix).toContainText('Thinner0.27 L');
      await expect(mix).toContainText(new RegExp(`Usable until ${shopTimePattern}`));

      // The first coat: the planned door, its planned primer step, the new pot.
      const coatForm = page.getByRole('region', { name: 'Record a coat' });
      await expect(coatForm.getByRole('button', { name: `Remove ${partLabel}` })).toBeVisible();
      await expect(coatForm.getByLabel('Coat', { exact: true })).toHaveValue('0');
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
      await expect(page.getByRole('article', { name: /^Coat \d+ of \d+, / })).toHaveCount(1);
      const [first] = (await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`)).items;
      const latest = page.getByRole('article', { name: /^Coat 1 of 3, LJ-26-105, / });
      await expect(latest).toContainText('dry film 57 µm');
      await expect(latest.getByText('Handle from').locator('..')).toContainText(clock(first.handleAt));
      await expect(latest).toContainText(new RegExp(`Flash-off until ${shopTimePattern}`));
      await expect(latest).toContainText(`Next on ${partLabel}: denib with P320, then coat 2 of 3`);
      // The door has just had its planned step: the form does not offer it again by itself.
      await expect(coatForm.getByText('No parts chosen yet.')).toBeVisible();

      // No connection: the tablet says so before anything is saved, and the second coat waits on it with its idempotency key.
      await context.setOffline(true);
      await expect(page.getByRole('status').filter({ hasText: 'This tablet is offline.' })).toBeVisible();
      await expect(coatForm.getByRole('button', { name: 'Record coat on this tablet' })).toBeVisible();
      await coatForm.getByRole('button', { name: 'Planned parts' }).click();
      await coatForm.getByRole('checkbox', { name: new RegExp(partLabel) }).check();
      // Chosen by hand, the door's step follows it to its next coat; the sprayer means a second pass of the first.
      await expect(coatForm.getByLabel('Coat', { exact: true })).toHaveValue('2');
      await coatForm.getByLabel('Coat', { exact: true }).selectOption('0');
      await box(coatForm, 'Wet film reading').fill('150');
      await expect(coatForm.getByText(/not ready to recoat until/)).toBeVisible();
      await coatForm.getByLabel('Why this coat goes on anyway').fill('Second pass on the edges while the first is wet');
      await coatForm.getByRole('button', { name: 'Record coat on this tablet' }).click();
      await expect(page.getByText('Pending — not yet on the server')).toBeVisible();
      expect((await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`)).total).toBe(1);

      await context.setOffline(false);
      await expect(page.getByRole('status').filter({ hasText: 'This tablet is offline.' })).toHaveCount(0);
      await expect(page.getByText('Pending — not yet on the server')).toBeHidden({ timeout: 20_000 });
      await expect(page.getByRole('article', { name: /^Coat \d+ of \d+, / })).toHaveCount(2);
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
      const doorCoats = coatRows(page, partLabel, 'coat 1 of 3');
      const firstRow = doorCoats.filter({ hasText: '140 µm wet' });
      await expect(firstRow).toContainText(/140 µm wet\s*57 µm dry/);
      await expect(firstRow).toContainText('LJ-26-105');
      await expect(firstRow).not.toContainText(/#\d/);
      const secondRow = doorCoats.filter({ hasText: '150 µm wet' });
      await secondRow.getByRole('button', { name: 'Recoat too soon' }).click();
      await expect(secondRow).toContainText('Reason: Second pass on the edges while the first is wet');
      await firstRow.getByRole('button', { name: /^Correct / }).click();
      const dialog = page.getByRole('dialog', { name: /^Correct the Kestrel 2K PU Primer White coat sprayed / });
      await dialog.getByRole('button', { name: 'Save correction' }).click();
      await expect(dialog.getByText('Say what was wrong')).toBeVisible();
      await dialog.getByLabel('Wet film').fill('130');
      await dialog.getByLabel('Reason for the correction').fill('Comb was read on the edge, not the face');
      await dialog.getByRole('button', { name: 'Save correction' }).click();
      await expect(dialog).toBeHidden();
      await expect(firstRow).toBeHidden();

      // The filters live in the address; the box shows ticked once the router has moved.
      await page.getByRole('checkbox', { name: 'Show history' }).click();
      await expect(page.getByRole('checkbox', { name: 'Show history' })).toBeChecked();
      await expect(page).toHaveURL(/history=true/);
      const replaced = doorCoats.filter({ hasText: '140 µm wet' });
      await expect(replaced).toHaveAccessibleName(/, replaced$/);
      await expect(replaced).toContainText('Corrected by v2');
      const correction = doorCoats.filter({ hasText: 'Why: Comb was read on the edge, not the face' });
      await expect(correction).toContainText(/130 µm wet\s*53 µm dry/);
      await expect(correction).toContainText('v2, corrects v1');
    } finally {
      await cancel();
      await api.context.dispose();
    }
  });

  test('a finishing lead may start over a stop only with a reason, which is recorded with the checks', async ({ page, baseURL }) => {
    const api = await leadApi(baseURL!);
    const { sessionId, cancel } = await bookSession(api);
    try {
      await signIn(page, 'lead', `/spray-sessions/${sessionId}`);
      await fillPreSprayChecks(page, /Air-fed hood or visor/);
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
    } finally {
      await cancel();
      await api.context.dispose();
    }
  });
});

interface DenibPlan {
  sessionId: number;
  cancel: () => Promise<void>;
  jobId: number;
  labels: { missed: string; due: string; ahead: string };
}

/**
 * Three fresh doors of the vanity job (2K PU primer, denib, two topcoats), all planned for their
 * first topcoat in a session booked now: one whose primer window closed hours ago, one between
 * coats with its window open, and one that has had the first topcoat already.
 */
async function bookTopcoatSession(api: LeadApi): Promise<DenibPlan> {
  const now = Date.now();
  const job = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const labels = { missed: `Door missed ${now}`, due: `Door due ${now}`, ahead: `Door ahead ${now}` };
  const ids: Record<string, number> = {};
  for (const [key, label] of Object.entries(labels)) ids[key] = (await api.send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, { label, lengthMm: 715, widthMm: 496, thicknessMm: 18 })).part.id;
  const booked = await bookSprayerNow(api, Object.values(ids).map((partId) => ({ partId, stepPosition: 2 })));
  const primer = (await api.get<List<{ id: number }>>('/api/products?q=PU%20Primer')).items[0].id;
  const topcoat = (await api.get<List<{ id: number }>>('/api/products?q=PU%20Topcoat')).items[0].id;
  const coat = (partIds: number[], productId: number, hoursAgo: number, stepPosition: number) =>
    api.send('POST', '/api/coats', { spraySessionId: booked.id, partIds, productId, stepPosition, sprayedAt: new Date(now - hoursAgo * 3_600_000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 });
  // The primer's window at 20 °C closes 24 h after the coat: 30 h ago means it closed 6 h ago.
  await coat([ids.missed], primer, 30, 0);
  await coat([ids.due, ids.ahead], primer, 3, 0);
  await coat([ids.ahead], topcoat, 2, 2);
  return { sessionId: booked.id, cancel: booked.cancel, jobId: job.id, labels };
}

test.describe('between coats', () => {
  test('a sprayer records a denib, and the coat form starts with the parts due, takes one reason for every stop and words a cold surface as below the dew point', async ({ page, baseURL }) => {
    test.setTimeout(120_000);
    const api = await leadApi(baseURL!);
    const { sessionId, jobId, labels, cancel } = await bookTopcoatSession(api);
    try {
      await page.setViewportSize({ width: 1024, height: 768 });
      await signIn(page, 'sprayer', `/spray-sessions/${sessionId}`);

      // The checklist: a part colder than the dew point is said to be below it.
      await fillPreSprayChecks(page, /Air-fed hood or visor/);
      await box(page, 'Relative humidity').fill('90');
      await box(page, 'Surface temperature').fill('14');
      await expect(page.getByText(/Surface\s*4\.3 °C below the dew point/)).toBeVisible();
      await expect(page.getByText(/The surface is 4\.3 °C below the dew point \(18\.3 °C\)/).first()).toBeVisible();
      await expect(page.getByText(/only -|only −/)).toHaveCount(0);
      await box(page, 'Relative humidity').fill('50');
      await box(page, 'Surface temperature').fill('19');
      await page.getByRole('button', { name: 'Start spraying' }).click();
      await expect(page.getByText('Spraying', { exact: true })).toBeVisible();

      // Only the doors whose next coat is the planned first topcoat are chosen; the one that had it is not.
      const coatForm = page.getByRole('region', { name: 'Record a coat' });
      const chosen = coatForm.getByRole('list', { name: 'Chosen parts' });
      await expect(chosen.getByRole('listitem')).toHaveCount(2);
      await expect(chosen).toContainText(labels.missed);
      await expect(chosen).toContainText(labels.due);
      await expect(chosen).not.toContainText(labels.ahead);
      await expect(coatForm.getByRole('note')).toContainText(`Denib first: ${labels.missed}, ${labels.due} need their denib before this coat.`);

      // Both chosen doors need their denib first; record it from the session page.
      const denibs = page.getByRole('region', { name: 'Denib between coats' });
      await expect(denibs).toContainText('2 planned parts need a denib before the next coat.');
      await denibs.getByRole('button', { name: 'Record a denib' }).click();
      await expect(denibs.getByRole('checkbox', { name: new RegExp(labels.missed) })).toBeChecked();
      await expect(denibs.getByRole('checkbox', { name: new RegExp(labels.due) })).toBeChecked();
      await expect(denibs.getByRole('checkbox', { name: new RegExp(labels.ahead) })).not.toBeChecked();
      await expect(denibs.getByLabel('Grit')).toHaveValue('P320');
      await denibs.getByLabel('Notes').fill('Faces and edges, tack rag after');
      await denibs.getByRole('button', { name: 'Record denib' }).click();
      await expect(page.getByText('Denib with P320 recorded on 2 parts.')).toBeVisible();
      await expect(denibs).toContainText('No planned part needs a denib right now.');
      await expect(coatForm.getByRole('note')).toHaveCount(0);
      const denibCard = page.getByRole('article', { name: /^Denib with P\d+, / });
      await expect(denibCard).toContainText('P320');
      await expect(denibCard).toContainText('by Mina Castell');
      await expect(denibCard).toContainText('Faces and edges, tack rag after');
      await page.screenshot({ path: `${shotsDir}/session-denib-1024.png`, fullPage: true });

      // Humid air and a cold part: three stops, one reason for all of them.
      await box(coatForm, 'Relative humidity').fill('90');
      await box(coatForm, 'Surface temperature').fill('14');
      await box(coatForm, 'Wet film reading').fill('100');
      const warnings = coatForm.getByRole('list', { name: 'Warnings for this coat' });
      await expect(warnings).toContainText(/The surface is 4\.3 °C below the dew point/);
      await expect(warnings).not.toContainText('recoat window had closed');
      await expect(coatForm.getByRole('textbox', { name: 'Why this coat goes on anyway' })).toHaveCount(1);
      await expect(coatForm.getByText('One reason for all 3 stops above; kept on the coat record with each.')).toBeVisible();
      await coatForm.getByRole('button', { name: 'Record coat' }).click();
      await expect(coatForm.getByText('Say why this coat goes on despite the stops before recording it.')).toBeVisible();
      await coatForm.getByRole('textbox', { name: 'Why this coat goes on anyway' }).fill('Customer collecting tonight; parts warmed after');
      await page.setViewportSize({ width: 1366, height: 900 });
      await page.screenshot({ path: `${shotsDir}/session-one-reason-1366.png`, fullPage: true });
      await coatForm.getByRole('button', { name: 'Record coat' }).click();
      await expect(page.getByText('Coat recorded on 2 parts.')).toBeVisible();
      await expect(coatForm.getByText('No parts chosen yet.')).toBeVisible();

      const [coat] = (await api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`)).items;
      const stops = coat.warnings.filter((w) => ['relative-humidity', 'dew-point-margin', 'surface-temperature'].includes(w.code));
      expect(stops.map((w) => w.acknowledgedReason)).toEqual(Array(3).fill('Customer collecting tonight; parts warmed after'));
      expect(coat.warnings.map((w) => w.code)).not.toContain('recoat-window-missed');

      // The coat log shows the denib in line with the coats, as a row of its own kind.
      await page.goto(`/coat-log?job=${jobId}`);
      const denibRow = page.getByRole('row', { name: /^Denib with P320, 2 parts, / });
      await expect(denibRow).toContainText('Denib with P320 · 2 parts');
      await expect(denibRow).toContainText('Mina Castell');
      const coatRow = coatRows(page, coat.partLabels.join(' and '), 'coat 2 of 3');
      await expect(coatRow.getByRole('button', { name: 'Humidity' })).toHaveAttribute('aria-expanded', 'false');
      await coatRow.getByRole('button', { name: 'Humidity' }).click();
      await expect(coatRow).toContainText('Reason: Customer collecting tonight; parts warmed after');
      const rows = await page.getByRole('row').evaluateAll((all) => all.map((row) => row.getAttribute('aria-label') ?? ''));
      const at = rows.findIndex((name) => name.startsWith('Denib with P320, 2 parts, '));
      expect(rows[at - 1]).toMatch(new RegExp(`^${escaped(coat.partLabels.join(' and '))}, LJ-26-105, coat 2 of 3, `));
      await page.screenshot({ path: `${shotsDir}/coat-log-denib-1366.png`, fullPage: true });
    } finally {
      await cancel();
      await api.context.dispose();
    }
  });
});
