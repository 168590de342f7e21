import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { expect, shotsDir, test } from './fixtures';
import { leadApi } from './lead-api';
import {
  bookTwoDoors,
  coatsOnServer,
  recordsOnServer,
  restartOffline,
  startShift,
  type Tablet,
} from './offline-helpers';
import {
  banner,
  checkAndStart,
  notKeptForSession,
  recordCoat,
  recordDenib,
  recordMix,
  recordTwoCoats,
  stopSpraying,
} from './offline-steps';

const offlineSave = 'Record coat on this tablet';

/** Two doors booked now, a fresh browser profile, and what the tablet's console may say without it being a problem. */
async function prepare(baseURL: string, expectedConsoleError: RegExp) {
  const api = await leadApi(baseURL);
  const booked = await bookTwoDoors(api);
  const profile = await mkdtemp(path.join(os.tmpdir(), 'boothwright-tablet-'));
  const expected = [/^Failed to load resource: the server responded with a status of 4\d\d/, expectedConsoleError];
  /** Closes whatever is still open, gives the sprayer back and removes the profile, even when a step failed. */
  const cleanUp = async (tablet: Tablet | undefined) => {
    await tablet?.context.close();
    await booked.cancel();
    await api.context.dispose();
    await rm(profile, { recursive: true, force: true });
  };
  return { api, ...booked, profile, expected, cleanUp };
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
    const { api, sessionId, doors, profile, expected, cleanUp } = await prepare(baseURL!, expectedConsoleError!);
    const problems: string[] = [];
    let tablet: Tablet | undefined;

    try {
      // Online: sign in, let the service worker take over the page, open the session from the list and start spraying.
      tablet = await startShift(profile, baseURL!, expected);
      let page = tablet.page;
      await page.locator(`a[href="/spray-sessions/${sessionId}"]`).click();
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      await checkAndStart(page);
      await recordMix(page);
      await expect(
        page.getByRole('article', { name: /^Mix: Kestrel 2K PU Primer White mixed at \d{2}:\d{2}$/ }),
      ).toBeVisible();

      // No network, and the page reloaded: it opens from the tablet, says it is offline and how old its copy is.
      await tablet.context.setOffline(true);
      await page.reload();
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      await expect(banner(page)).toContainText('Offline — nothing waiting to send');
      await expect(banner(page)).toContainText(/Showing the copy saved on this tablet at \d{2}:\d{2}/);
      await page
        .getByRole('region', { name: 'Record a coat' })
        .getByRole('button', { name: `Remove ${doors[1]}` })
        .click();
      await recordCoat(page, doors[0], offlineSave);
      await expect(banner(page)).toContainText('Offline — 1 coat waiting to send');
      await recordCoat(page, doors[1], offlineSave);
      await expect(banner(page)).toContainText('Offline — 2 coats waiting to send');
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(2);
      await page.screenshot({ path: path.join(shotsDir, 'offline-tablet-two-waiting.png'), fullPage: true });
      expect((await coatsOnServer(api, sessionId)).total).toBe(0);
      await tablet.context.close();
      problems.push(...tablet.problems);

      // The browser restarted, still with no network: the session and both waiting coats are still there.
      tablet = await restartOffline(profile, baseURL!, expected, sessionId);
      page = tablet.page;
      await expect(banner(page)).toContainText('Offline — 2 coats waiting to send');
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(2);

      // Back online: the queue drains by itself, each coat once.
      await tablet.context.setOffline(false);
      await expect(banner(page)).toHaveCount(0);
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(0, { timeout: 20_000 });
      await expect(page.getByRole('article', { name: /^Coat \d+ of \d+, / })).toHaveCount(2);
      const onServer = await coatsOnServer(api, sessionId);
      expect(onServer.total).toBe(2);
      const coated = onServer.items.map((coat) => coat.partIds.length);
      expect(coated).toEqual([1, 1]);
      expect(new Set(onServer.items.flatMap((coat) => coat.partIds)).size).toBe(2);
      await tablet.context.close();
      problems.push(...tablet.problems);
      tablet = undefined;
    } finally {
      await cleanUp(tablet);
    }
    expect(problems, 'the tablet browser reported problems').toEqual([]);
  });

  test('a session never opened on the tablet runs whole with no network, and every record reaches the server once, in order', async ({
    baseURL,
    expectedConsoleError,
  }) => {
    test.setTimeout(150_000);
    const { api, sessionId, doors, profile, expected, cleanUp } = await prepare(baseURL!, expectedConsoleError!);
    const problems: string[] = [];
    let tablet: Tablet | undefined;

    try {
      // Online at the start of the shift: sign in and open My sessions, which reads today's sessions ahead.
      tablet = await startShift(profile, baseURL!, expected);
      let page = tablet.page;
      const row = page.locator(`a[href="/spray-sessions/${sessionId}"]`);
      await expect(row).toBeVisible();
      await expect.poll(() => notKeptForSession(page, sessionId), { timeout: 20_000 }).toEqual([]);

      // The network goes; the sprayer opens the session for the first time on this tablet and runs it.
      await tablet.context.setOffline(true);
      await row.click();
      await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
      await expect(banner(page)).toContainText('Offline — nothing waiting to send');
      await checkAndStart(page);
      await expect(page.getByText(/^Waiting to send: these checks are kept on this tablet/)).toBeVisible();
      await recordMix(page);
      await expect(
        page.getByText(/^Waiting to send: kept on this tablet, worked out from the data sheet/),
      ).toBeVisible();
      await recordTwoCoats(page, doors, offlineSave);
      await recordDenib(page, doors[0]);
      await stopSpraying(page);
      const waiting = 'Offline — 2 session steps, 1 mix, 2 coats and 1 denib waiting to send';
      await expect(banner(page)).toContainText(waiting);
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(6);
      await page.screenshot({ path: path.join(shotsDir, 'offline-tablet-whole-session.png'), fullPage: true });
      expect((await recordsOnServer(api, sessionId)).spraySession.state).toBe('planned');
      await tablet.context.close();
      problems.push(...tablet.problems);

      // The browser restarts with no network: all of it is still there, the session still shown as clearing.
      tablet = await restartOffline(profile, baseURL!, expected, sessionId);
      page = tablet.page;
      await expect(banner(page)).toContainText(waiting);
      await expect(page.getByRole('heading', { name: 'Clearing the air' })).toBeVisible();

      // Back online: sent by themselves, in order, each once.
      await tablet.context.setOffline(false);
      await expect(page.getByText('Pending — not yet on the server')).toHaveCount(0, { timeout: 30_000 });
      await expect(page.getByRole('heading', { name: 'Clearing the air' })).toBeVisible();
      const onServer = await recordsOnServer(api, sessionId);
      expect(onServer.spraySession).toMatchObject({
        state: 'clearing',
        checklist: { completedByName: 'Mina Castell' },
      });
      expect(onServer.mixes).toHaveLength(1);
      expect(onServer.coats.map((coat) => coat.mixId)).toEqual([onServer.mixes[0].id, onServer.mixes[0].id]);
      expect(new Set(onServer.coats.flatMap((coat) => coat.partIds)).size).toBe(2);
      expect(onServer.denibs).toHaveLength(1);
      // In the order made: checks before the pot, the pot before the coats, the stop last.
      const checkedAt = Date.parse(onServer.spraySession.checklist!.completedAt);
      expect(Date.parse(onServer.mixes[0].mixedAt)).toBeGreaterThanOrEqual(checkedAt);
      expect(Math.min(...onServer.coats.map((coat) => Date.parse(coat.sprayedAt)))).toBeGreaterThanOrEqual(
        Date.parse(onServer.mixes[0].mixedAt),
      );
      expect(Date.parse(onServer.spraySession.clearingStartedAt!)).toBeGreaterThanOrEqual(
        Date.parse(onServer.denibs[0].abradedAt),
      );
      await tablet.context.close();
      problems.push(...tablet.problems);
      tablet = undefined;
    } finally {
      await cleanUp(tablet);
    }
    expect(problems, 'the tablet browser reported problems').toEqual([]);
  });
});
