import type { Locator, Page } from '@playwright/test';
import { expect } from './fixtures';

/** A number box by its label; the − and + buttons beside it name the field too. */
export const box = (scope: Page | Locator, label: string) => scope.getByRole('textbox', { name: new RegExp(`^${label}`) });

const click = (target: Locator) => target.click();

/**
 * The pre-spray checks as a sprayer fills them: extraction, filters and respirator ticked, face
 * velocity, the mask worn and the booth's conditions. `press` is how a switch is pressed (a tap on
 * the tablet tests).
 */
export async function fillPreSprayChecks(page: Page, mask: RegExp = /Air-fed hood or visor/, press: (target: Locator) => Promise<void> = click) {
  for (const check of [/Extraction is running/, /Filters checked/, /Respirator fitted/]) await press(page.getByRole('switch', { name: check }));
  await box(page, 'Face velocity measured').fill('0.55');
  await page.getByRole('radio', { name: mask }).check();
  await box(page, 'Air temperature').fill('20');
  await box(page, 'Relative humidity').fill('50');
  await box(page, 'Surface temperature').fill('19');
}

/** The pre-spray checks, then "Start spraying", and the session says it is spraying. */
export async function checkAndStart(page: Page, mask?: RegExp) {
  await fillPreSprayChecks(page, mask);
  await page.getByRole('button', { name: 'Start spraying' }).click();
  await expect(page.getByText('Spraying', { exact: true })).toBeVisible();
}
