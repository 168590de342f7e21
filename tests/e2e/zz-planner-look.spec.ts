import { test } from '@playwright/test';
import { signIn } from './helpers';

test('look', async ({ page }) => {
  const errors: string[] = [];
  page.on('console', (m) => { if (m.type() === 'error' || m.type() === 'warning') errors.push(m.text()); });
  await signIn(page, 'lead', '/planner');
  await page.getByLabel('Go to day').fill(process.env.PL_DAY!);
  await page.getByRole('button', { name: 'Day', exact: true }).click();
  await page.waitForTimeout(800);
  await page.screenshot({ path: '/tmp/shots/planner-day-booths-1280.png', fullPage: true });
  await page.getByRole('button', { name: 'Book a session' }).click();
  const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
  await dialog.getByLabel('Job').selectOption({ index: 1 });
  await dialog.getByRole('button', { name: /^Choose all/ }).click();
  await page.waitForTimeout(300);
  await page.screenshot({ path: '/tmp/shots/planner-form-1280.png' });
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.waitForTimeout(800);
  await page.screenshot({ path: '/tmp/shots/planner-phone-390.png', fullPage: true });
  await page.setViewportSize({ width: 1024, height: 768 });
  await page.getByRole('button', { name: 'Week', exact: true }).click();
  await page.waitForTimeout(500);
  await page.screenshot({ path: '/tmp/shots/planner-week-1024.png' });
  console.log(errors.join('\n'));
});
