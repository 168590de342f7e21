import { expect, test } from './fixtures';
import { mainNav, signIn } from './helpers';

test.describe('racks', () => {
  test('a lead adds an unheated rack and sees it in the table', async ({ page }) => {
    const name = `Test trolley ${Date.now()}`;
    await signIn(page, 'lead', '/racks');
    await page.getByRole('button', { name: 'Add rack' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a rack' });
    await dialog.getByLabel('Name', { exact: true }).fill(name);
    await dialog.getByLabel('Where it stands').selectOption('booth-side');
    await dialog.getByLabel('Shelves').fill('6');
    await dialog.getByLabel('Usable area per shelf').fill('0.5');
    await dialog.getByRole('button', { name: 'Save rack' }).click();
    await expect(dialog).toBeHidden();
    const row = page.getByRole('row', { name: new RegExp(name) });
    await expect(row).toContainText('Beside the booth');
    await expect(row).toContainText('3.00 m²');
    await expect(row).toContainText('Unheated');
  });
});

test.describe('settings', () => {
  test('the admin’s server-side field errors appear beside the field', async ({ page }) => {
    await signIn(page, 'admin', '/settings/users');
    await page.getByRole('button', { name: 'Add user' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a user' });
    await dialog.getByLabel('Name', { exact: true }).fill('Second Lead');
    await dialog.getByLabel('E-mail').fill('lead@larchmere.test');
    await dialog.getByLabel('First password').fill('a-long-enough-password');
    await dialog.getByRole('button', { name: 'Save user' }).click();
    await expect(dialog.getByText('Already in use')).toBeVisible();
    await expect(dialog.getByLabel('E-mail')).toHaveAttribute('aria-invalid', 'true');
  });

  test('a common password is refused with the reason beside the field', async ({ page }) => {
    await signIn(page, 'admin', '/settings/users');
    await page.getByRole('button', { name: 'Add user' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a user' });
    await dialog.getByLabel('Name', { exact: true }).fill('Pat Weakley');
    await dialog.getByLabel('E-mail').fill(`pat.weakley.${Date.now()}@larchmere.test`);
    await dialog.getByLabel('First password').fill('password12');
    await dialog.getByRole('button', { name: 'Save user' }).click();
    await expect(dialog.getByText(/commonly used password/)).toBeVisible();
    await expect(dialog.getByLabel('First password')).toHaveAttribute('aria-invalid', 'true');
  });

  test('the admin adds a user, then disables them after confirming', async ({ page }) => {
    const email = `new.sprayer.${Date.now()}@larchmere.test`;
    await signIn(page, 'admin', '/settings/users');
    await page.getByRole('button', { name: 'Add user' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a user' });
    await dialog.getByLabel('Name', { exact: true }).fill('Ola Fenwick');
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByLabel('Role').selectOption('sprayer');
    await dialog.getByLabel('First password').fill('a-long-enough-password');
    await dialog.getByRole('button', { name: 'Save user' }).click();
    await expect(dialog).toBeHidden();

    const row = page.getByRole('row', { name: new RegExp(email.replace(/\./g, '\\.')) });
    await expect(row).toContainText('Active');
    await row.getByRole('button', { name: 'Disable Ola Fenwick' }).click();
    const confirm = page.getByRole('dialog', { name: 'Disable Ola Fenwick?' });
    await confirm.getByRole('button', { name: 'Disable' }).click();
    await expect(row).toContainText('Disabled');
  });

  test('the owner picks the shop’s language and region and its currency from short lists', async ({ page }) => {
    await signIn(page, 'admin', '/settings/shop');
    const locale = page.getByLabel('Language and region');
    const currency = page.getByLabel('Currency');
    await expect(locale).toHaveValue('en-GB');
    await expect(currency).toHaveValue('GBP');
    await expect(locale.getByRole('option')).toHaveText(['English (United Kingdom)', 'English (Ireland)', 'English (United States)', 'German (Germany)', 'French (France)', 'Dutch (Netherlands)']);
    await expect(currency.getByRole('option')).toHaveText(['Pound sterling (£)', 'Euro (€)', 'US dollar ($)']);
    await currency.selectOption('EUR');
    await expect(page.getByRole('button', { name: 'Save shop settings' })).toBeEnabled();
  });

  test('a sprayer reads the shop settings but cannot change them', async ({ page }) => {
    await signIn(page, 'sprayer', '/settings/shop');
    await expect(page.getByText('Only the owner can change them')).toBeVisible();
    await expect(page.getByText('Europe/London')).toBeVisible();
    await expect(page.getByText('English (United Kingdom)')).toBeVisible();
    await expect(page.getByText('Pound sterling (£)')).toBeVisible();
    await expect(page.getByRole('button', { name: 'Save shop settings' })).toHaveCount(0);
  });

  test('choosing US units in my preferences changes how booths are shown', async ({ page }) => {
    await signIn(page, 'assembler', '/settings/preferences');
    await page.getByLabel(/US customary/).check();
    await page.getByRole('button', { name: 'Save preferences' }).click();
    await expect(page.getByText('Your preferences are saved.')).toBeVisible();

    await mainNav(page).getByRole('link', { name: 'Booths' }).click();
    await expect(page.getByRole('row', { name: /Booth 1 \(cross-draft\)/ })).toContainText('cfm');

    await mainNav(page).getByRole('link', { name: 'My preferences' }).click();
    await page.getByLabel(/Metric/).check();
    await page.getByRole('button', { name: 'Save preferences' }).click();
    await expect(page.getByText('Your preferences are saved.').first()).toBeVisible();
  });

  test('a sprayer opens the calculator with the booths to hand', async ({ page }) => {
    await signIn(page, 'sprayer', '/calculator');
    await expect(page.getByRole('heading', { name: 'Calculator', level: 1 })).toBeVisible();
    await expect(mainNav(page).getByRole('link', { name: 'Calculator' })).toHaveAttribute('aria-current', 'page');
  });
});

test('a lead reads the activity log, newest first, in the shop’s time', async ({ page }) => {
  await signIn(page, 'lead', '/activity');
  const table = page.getByRole('table', { name: 'Activity log' });
  await expect(table).toBeVisible();
  await expect(table.getByRole('row')).not.toHaveCount(1);
  await expect(page.getByText(/of \d+ entries/)).toBeVisible();
});
