import { chromium, type BrowserContext, type Page } from '@playwright/test';
import type { Mix } from '../../shared/schemas/checklist';
import type { Coat } from '../../shared/schemas/coat';
import type { Denib } from '../../shared/schemas/denib';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import type { SpraySession } from '../../shared/schemas/spray-session';
import { expect } from './fixtures';
import { mainNav, signIn } from './helpers';
import { bookSprayerNow, type LeadApi } from './lead-api';

/** Chromium as the browser tests run it, but with a profile on disk, so closing it is a real browser restart. */
export function launchTablet(userDataDir: string, baseURL: string): Promise<BrowserContext> {
  return chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
    baseURL,
    viewport: { width: 1280, height: 800 },
    // The other browser tests block workers (playwright.config.ts); this one is about the worker.
    serviceWorkers: 'allow',
  });
}

async function openPage(context: BrowserContext): Promise<Page> {
  return context.pages()[0] ?? context.newPage();
}

/** A tablet browser with its console watched: what it reports wrong is added to `problems`. */
export interface Tablet {
  context: BrowserContext;
  page: Page;
  problems: string[];
}

/** The start of a shift: the tablet browser launched, Mina signed in, the service worker in charge, My sessions open. */
export async function startShift(profile: string, baseURL: string, expected: RegExp[]): Promise<Tablet> {
  const context = await launchTablet(profile, baseURL);
  const problems = guardContext(context, expected);
  const page = await openPage(context);
  await signIn(page, 'sprayer');
  await expect
    .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
    .toBe(true);
  await mainNav(page).getByRole('link', { name: 'Spray sessions' }).click();
  return { context, page, problems };
}

/** The same tablet after a browser restart with no network, opening the session again. */
export async function restartOffline(
  profile: string,
  baseURL: string,
  expected: RegExp[],
  sessionId: number,
): Promise<Tablet> {
  const context = await launchTablet(profile, baseURL);
  const problems = guardContext(context, expected);
  await context.setOffline(true);
  const page = await openPage(context);
  await page.goto(`/spray-sessions/${sessionId}`);
  return { context, page, problems };
}

/**
 * The console guard of fixtures.ts, for a context the test launches itself (a persistent one is not
 * made by `browser.newContext`, so the fixture cannot see it). Returns what went wrong.
 */
export function guardContext(context: BrowserContext, expected: RegExp[]): string[] {
  const problems: string[] = [];
  const watch = (page: Page) => {
    page.on('console', (message) => {
      if (message.type() === 'error' && !expected.some((pattern) => pattern.test(message.text())))
        problems.push(`console error on ${page.url()}: ${message.text()}`);
    });
    page.on('pageerror', (error) => problems.push(`page error on ${page.url()}: ${error.message}`));
    page.on('response', (response) => {
      if (response.status() >= 500)
        problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
    });
  };
  context.pages().forEach(watch);
  context.on('page', watch);
  return problems;
}

/**
 * Two fresh doors on a job of their own with the demo vanity job's system (2K PU primer first),
 * booked now in Booth 1 for Mina, the demo sprayer. Other tests count the demo job's parts.
 */
export async function bookTwoDoors(
  api: LeadApi,
): Promise<{ sessionId: number; cancel: () => Promise<void>; doors: string[] }> {
  const now = Date.now();
  const vanity = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const dueDate = new Date(now + 14 * 86_400_000).toISOString().slice(0, 10);
  const { job } = await api.send<{ job: Job }>('POST', '/api/jobs', {
    customer: 'Offline tablet test',
    reference: `OFF-${now.toString(36).toUpperCase()}`,
    dueDate,
    finishSystemId: vanity.finishSystemId,
  });
  const doors = [`Offline door A ${now}`, `Offline door B ${now}`];
  const parts = [];
  for (const label of doors)
    parts.push(
      (
        await api.send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, {
          label,
          lengthMm: 715,
          widthMm: 496,
          thicknessMm: 18,
        })
      ).part,
    );
  const booked = await bookSprayerNow(
    api,
    parts.map((part) => ({ partId: part.id, stepPosition: 0 })),
  );
  return { sessionId: booked.id, cancel: booked.cancel, doors };
}

export async function coatsOnServer(api: LeadApi, sessionId: number): Promise<List<Coat>> {
  return api.get<List<Coat>>(`/api/coats?spraySessionId=${sessionId}`);
}

/** Everything the session holds on the server: what the tablet sent, each once. */
export async function recordsOnServer(api: LeadApi, sessionId: number) {
  const [{ spraySession }, mixes, coats, denibs] = await Promise.all([
    api.get<{ spraySession: SpraySession }>(`/api/spray-sessions/${sessionId}`),
    api.get<{ items: Mix[] }>(`/api/spray-sessions/${sessionId}/mixes`),
    coatsOnServer(api, sessionId),
    api.get<List<Denib>>(`/api/denibs?spraySessionId=${sessionId}`),
  ]);
  return { spraySession, mixes: mixes.items, coats: coats.items, denibs: denibs.items };
}
