import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { BrowserContext, Locator, Page } from '@playwright/test';
import { expect, shotsDir, test } from './fixtures';
import { mainNav, signIn } from './helpers';
import { leadApi } from './lead-api';
import { bookTwoDoors, coatsOnServer, guardContext, launchTablet } from './offline-helpers';

/** A number box by its label; the − and + buttons beside it name the field too. */
const box = (scope: Page | Locator, label: string) => scope.getByRole('textbox', { name: new RegExp(`^${label}`) });
const banner = (page: Page) => page.getByRole('status').filter({ hasText: 'This tablet is offline.' });

async function checkAndStartSpraying(page: Page) {
  for (const check of [/Extraction is running/, /Filters checked/, /Respirator fitted/])
    await page.getByRole('switch', { name: check }).click();
  await box(page, 'Face velocity measured').fill('0.55');
  await page.getByRole('radio', { name: /Air-fed hood or visor/ }).check();
  await box(page, 'Air temperature').fill('20');
  await box(page, 'Relative humidity').fill('50');
  await box(page, 'Surface temperature').fill('19');
  await page.getByRole('button', { name: 'Start spraying' }).click();
  await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
  await page.getByRole('button', { name: 'Record a mix' }).click();
  await box(page, 'Amount to mix').fill('3');
  await page.getByRole('button', { name: 'Record mix' }).click();
  await expect(page.getByRole('article', { name: /^Mix: Kestrel 2K PU Primer White mixed at \d{2}:\d{2}$/ })).toBeVisible();
}

async function recordOfflineCoat(page: Page, door: string) {
  const coatForm = page.getByRole('region', { name: 'Record a coat' });
  await expect(coatForm.getByRole('button', { name: `Remove ${door}` })).toBeVisible();
  await box(coatForm, 'Wet film reading').fill('140');
  await coatForm.getByRole('button', { name: 'Record coat on this tablet' }).click();
}

async function openPage(context: BrowserContext): Promise<Page> {
  return context.pages()[0] ?? context.newPage();
}

test.describe('booth tablet offline', () => {
  // Taking the tablet off line makes the browser report the requests it could not send (the live stream among them).
  test.use({
    expectedConsoleError: /net::ERR_INTERNET_DISCONNECTED|net::ERR_NETWORK_CHANGED|net::ERR_NAME_NOT_RESOLVED/,
  });

  test('a session opens with no network, two coats recorded offline survive a browser restart and reach the server once', async ({
    baseURL,
    expectedConsoleError,
  }) => {
    test.setTimeout(120_000);
    const api = await leadApi(baseURL!);
    const { sessionId, doors } = await bookTwoDoors(api);
    const profile = await mkdtemp(path.join(os.tmpdir(), 'boothwright-tablet-'));
    const expected = [/^Failed to load resource: the server responded with a status of 4\d\d/, expectedConsoleError!];
    const problems: string[] = [];

    try {
      // Online: sign in, let the service worker take over the page, open the session from the list and start spraying.
      let tablet = await launchTablet(profile, baseURL!);
      const firstRun = guardContext(tablet, expected);
      let page = await openPage(tablet);
      await signIn(page, 'sprayer');
      await expect
        .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
        .toBe(true);
      await mainNav(page).getByRole('link', { name: 'Spray sessions' }).click();
      await page.locator(`a[href="/spray-sessions/${sessionId}"]`).click();
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      await checkAndStartSpraying(page);

      // No network, and the page reloaded: it opens from the tablet, says it is offline and how old its copy is.
      await tablet.setOffline(true);
      await page.reload();
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      await expect(banner(page)).toContainText('Offline — nothing waiting to send');
      await expect(banner(page)).toContainText(/Showing the copy saved on this tablet at \d{2}:\d{2}/);
      await page
        .getByRole('region', { name: 'Record a coat' })
        .getByRole('button', { name: `Remove ${doors[1]}` })
        .click();
      await recordOfflineCoat(page, doors[0]);
      await expect(banner(page)).toContainText('Offline — 1 coat waiting to send');
      await recordOfflineCoat(page, doors[1]);
      await expect(banner(page)).toContainText('Offline — 2 coats waiting to send');
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(2);
      await page.screenshot({ path: path.join(shotsDir, 'offline-tablet-two-waiting.png'), fullPage: true });
      expect((await coatsOnServer(api, sessionId)).total).toBe(0);
      await tablet.close();
      problems.push(...firstRun);

      // The browser restarted, still with no network: the session and both waiting coats are still there.
      tablet = await launchTablet(profile, baseURL!);
      const secondRun = guardContext(tablet, expected);
      await tablet.setOffline(true);
      page = await openPage(tablet);
      await page.goto(`/spray-sessions/${sessionId}`);
      await expect(banner(page)).toContainText('Offline — 2 coats waiting to send');
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(2);

      // Back online: the queue drains by itself, each coat once.
      await tablet.setOffline(false);
      await expect(banner(page)).toHaveCount(0);
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(0, { timeout: 20_000 });
      await expect(page.getByRole('article', { name: /^Coat \d+$/ })).toHaveCount(2);
      const onServer = await coatsOnServer(api, sessionId);
      expect(onServer.total).toBe(2);
      const coated = onServer.items.map((coat) => coat.partIds.length);
      expect(coated).toEqual([1, 1]);
      expect(new Set(onServer.items.flatMap((coat) => coat.partIds)).size).toBe(2);
      await tablet.close();
      problems.push(...secondRun);
    } finally {
      await api.context.dispose();
      await rm(profile, { recursive: true, force: true });
    }
    expect(problems, 'the tablet browser reported problems').toEqual([]);
  });
});
