import type { Locator, Page } from '@playwright/test';
import { box, fillPreSprayChecks } from './booth-steps';
import { expect } from './fixtures';

/** Touch targets on the booth tablet: at least 44 px each way, so a gloved finger hits them. */
export async function tap(target: Locator) {
  await expect(target).toBeVisible();
  const box = (await target.boundingBox())!;
  expect(box.height, 'a tap target on the booth tablet is at least 44 px high').toBeGreaterThanOrEqual(44);
  expect(box.width, 'a tap target on the booth tablet is at least 44 px wide').toBeGreaterThanOrEqual(44);
  await target.tap();
}

export const coatForm = (page: Page) => page.getByRole('region', { name: 'Record a coat' });
export const coatCards = (page: Page) => page.getByRole('article', { name: /^Coat \d+ of \d+, / });

/** The pre-spray checks for a water-borne coat: extraction, filters, mask, conditions; then spraying starts. */
export async function runChecklist(page: Page) {
  await fillPreSprayChecks(page, /vapour and particulate filters/, tap);
  await expect(page.getByText('Go: fit to spray')).toBeVisible();
  await tap(page.getByRole('button', { name: 'Start spraying' }));
  await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
}

export async function recordMix(page: Page, product: string) {
  await tap(page.getByRole('button', { name: 'Record a mix' }));
  await page.getByLabel('Product', { exact: true }).selectOption({ label: product });
  await box(page, 'Amount to mix').fill('1.5');
  await tap(page.getByRole('button', { name: 'Record mix' }));
  await expect(page.getByRole('article', { name: new RegExp(`^Mix: ${product} mixed at \\d{2}:\\d{2}$`) })).toBeVisible();
}

/** Records the coat the form holds with a comb reading; the form must hold no stop to answer. */
export async function recordCoat(page: Page, wetFilmUm: number, coatsBefore: number) {
  const form = coatForm(page);
  await box(form, 'Wet film reading').fill(String(wetFilmUm));
  await expect(form.getByRole('textbox', { name: 'Why this coat goes on anyway' })).toHaveCount(0);
  await tap(form.getByRole('button', { name: 'Record coat' }));
  await expect(coatCards(page)).toHaveCount(coatsBefore + 1);
}

/** The denib form starts with the parts that need one ticked and the system's grit. */
export async function recordDenib(page: Page, partCount: number) {
  const denib = page.getByRole('region', { name: 'Denib between coats' });
  await expect(denib).toContainText(`${partCount} planned parts need a denib before the next coat.`);
  await tap(denib.getByRole('button', { name: 'Record a denib' }));
  await expect(denib.getByLabel('Grit')).toHaveValue('P320');
  await tap(denib.getByRole('button', { name: 'Record denib' }));
  await expect(denib).toContainText('No planned part needs a denib right now.');
}

/** "HH:MM" of a time the latest coat card gives, e.g. "Handle from". */
export async function latestCoatTime(page: Page, label: string): Promise<string> {
  const text = await coatCards(page).first().getByText(label, { exact: true }).locator('..').textContent();
  return /\d\d:\d\d/.exec(text ?? '')![0];
}

export async function stopSpraying(page: Page) {
  await tap(page.getByRole('button', { name: 'Spraying stopped' }));
  await tap(page.getByRole('button', { name: 'Yes, spraying has stopped' }));
  await expect(page.getByRole('heading', { name: 'Clearing the air' })).toBeVisible();
}
