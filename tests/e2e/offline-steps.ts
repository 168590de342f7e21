import type { Page } from '@playwright/test';
import { box, checkAndStart } from './booth-steps';
import { expect } from './fixtures';

export { checkAndStart };
export const banner = (page: Page) => page.getByRole('status').filter({ hasText: 'This tablet is offline.' });

/** Three litres of the primer, the first product offered. */
export async function recordMix(page: Page) {
  await page.getByRole('button', { name: 'Record a mix' }).click();
  await box(page, 'Amount to mix').fill('3');
  await page.getByRole('button', { name: 'Record mix' }).click();
}

export async function recordCoat(page: Page, door: string, saveLabel: string) {
  const coatForm = page.getByRole('region', { name: 'Record a coat' });
  await expect(coatForm.getByRole('button', { name: `Remove ${door}` })).toBeVisible();
  await box(coatForm, 'Wet film reading').fill('140');
  await coatForm.getByRole('button', { name: saveLabel }).click();
}

/** One coat per door: the form starts with both, so the second door is taken off for the first coat. */
export async function recordTwoCoats(page: Page, doors: string[], saveLabel: string) {
  await page
    .getByRole('region', { name: 'Record a coat' })
    .getByRole('button', { name: `Remove ${doors[1]}` })
    .click();
  await recordCoat(page, doors[0], saveLabel);
  await recordCoat(page, doors[1], saveLabel);
}

export async function recordDenib(page: Page, door: string) {
  const denibs = page.getByRole('region', { name: 'Denib between coats' });
  await denibs.getByRole('button', { name: 'Record a denib' }).click();
  const part = denibs.getByRole('checkbox', { name: new RegExp(door) });
  if (!(await part.isChecked())) await part.check();
  await denibs.getByRole('button', { name: 'Record denib' }).click();
  await expect(denibs.getByRole('button', { name: 'Record a denib' })).toBeVisible();
}

export async function stopSpraying(page: Page) {
  await page.getByRole('button', { name: 'Spraying stopped' }).click();
  await page.getByRole('button', { name: 'Yes, spraying has stopped' }).click();
  await expect(page.getByRole('heading', { name: 'Clearing the air' })).toBeVisible();
}

/** What the service worker does not keep yet of the reads one session page makes (none once My sessions has read it ahead). */
export async function notKeptForSession(page: Page, sessionId: number): Promise<string[]> {
  const urls = await page.evaluate(async () => (await (await caches.open('boothwright-api')).keys()).map((r) => r.url));
  const wanted = [
    `/api/spray-sessions/${sessionId}$`,
    `/api/spray-sessions/${sessionId}/mixes$`,
    `/api/spray-sessions/${sessionId}/fitness$`,
    `/api/coats\\?.*spraySessionId=${sessionId}\\b`,
    `/api/denibs\\?.*spraySessionId=${sessionId}\\b`,
    '/api/parts\\?',
    '/api/ready\\?',
    '/api/readings\\?',
    '/api/booths/1$',
  ];
  return wanted.filter((pattern) => !urls.some((url) => new RegExp(pattern).test(url)));
}
