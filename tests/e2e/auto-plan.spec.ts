import { expect, test } from './fixtures';
import { signIn } from './helpers';

test('a lead auto-plans a job’s coats and books them all at once', async ({ page }) => {
  test.slow();
  await signIn(page, 'lead', '/planner');
  await page.getByRole('button', { name: 'Auto-plan jobs' }).click();
  const dialog = page.getByRole('dialog', { name: 'Auto-plan jobs' });
  await dialog.getByRole('checkbox', { name: /LJ-26-105/ }).check();
  await dialog.getByRole('button', { name: 'Propose a plan' }).click();
  // The demo vanity doors' system: 2K PU primer, denib, two topcoats — three coats to book.
  const sessions = dialog.getByRole('table', { name: 'Proposed spray sessions' });
  await expect(sessions.getByRole('row')).toHaveCount(4);
  await expect(sessions).toContainText('Coat 1 of 3: Kestrel 2K PU Primer White');
  await expect(sessions.getByRole('row').filter({ hasText: 'Coat 2 of 3: Kestrel 2K PU Topcoat Satin' })).toContainText('After a denib with P320');
  await expect(sessions).toContainText('Coat 3 of 3: Kestrel 2K PU Topcoat Satin');
  // Dates and times as the shop reads them, never as ISO strings.
  await expect(dialog).not.toContainText(/\d{4}-\d{2}-\d{2}/);
  await expect(dialog.getByRole('list', { name: 'Jobs in the proposal' })).toContainText(/\(due \w{3},? \d{1,2} \w{3} \d{4}/);
  await expect(dialog.getByRole('list', { name: 'Jobs in the proposal' })).toContainText('LJ-26-105');
  await page.screenshot({ path: '/tmp/shots/planner-auto-plan.png', fullPage: true });
  await dialog.getByRole('button', { name: 'Book all 3 sessions' }).click();
  await expect(page.getByText('Booked 3 spray sessions')).toBeVisible();
  await expect(dialog).toBeHidden();

  // Asked again, it starts from what is now booked: nothing is proposed twice.
  await page.getByRole('button', { name: 'Auto-plan jobs' }).click();
  await dialog.getByRole('checkbox', { name: /LJ-26-105/ }).check();
  await dialog.getByRole('button', { name: 'Propose a plan' }).click();
  await expect(dialog.getByText('Nothing to book: every chosen job is finished, already booked, or could not be fitted (see above).')).toBeVisible();
  const job = dialog.getByRole('list', { name: 'Jobs in the proposal' });
  await expect(job).toContainText('Coat 1 of 3 (Kestrel 2K PU Primer White) is already booked');
  await expect(job).toContainText('Coat 3 of 3 (Kestrel 2K PU Topcoat Satin) is already booked');
});

test('a sprayer has no auto-plan button', async ({ page }) => {
  await signIn(page, 'sprayer', '/planner');
  await expect(page.getByRole('heading', { name: 'Booth planner' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Auto-plan jobs' })).toHaveCount(0);
});
