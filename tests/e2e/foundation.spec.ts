import fs from 'node:fs';
import { expect, test } from './fixtures';
import { demo, demoPassword, mainNav, signIn, type DemoRole } from './helpers';

const navByRole: Record<DemoRole, { shown: string[]; hidden: string[] }> = {
  admin: { shown: ['Today', 'Booths', 'Racks', 'Calculator', 'Reports', 'Activity log', 'My preferences', 'Shop', 'Users'], hidden: [] },
  lead: { shown: ['Today', 'Booths', 'Racks', 'Calculator', 'Reports', 'Activity log', 'My preferences', 'Shop'], hidden: ['Users'] },
  sprayer: { shown: ['Today', 'Booths', 'Racks', 'Calculator', 'My preferences', 'Shop'], hidden: ['Users', 'Activity log', 'Reports'] },
  // An assembler's day is the ready board: they land on it, and have no Today of their own.
  assembler: { shown: ['Ready board', 'Booths', 'Racks', 'My preferences', 'Shop'], hidden: ['Today', 'Users', 'Activity log', 'Calculator', 'Reports'] },
};
const landing: Record<DemoRole, { heading: string; nav: string }> = {
  admin: { heading: 'Today', nav: 'Today' },
  lead: { heading: 'Today', nav: 'Today' },
  sprayer: { heading: 'Today', nav: 'Today' },
  assembler: { heading: 'Ready board', nav: 'Ready board' },
};

test.describe('signing in and the navigation each role sees', () => {
  for (const role of Object.keys(navByRole) as DemoRole[]) {
    test(`${role === 'admin' || role === 'assembler' ? 'an' : 'a'} ${role} sees the navigation for their role and their name`, async ({ page }) => {
      await signIn(page, role);
      await expect(page.getByRole('heading', { name: landing[role].heading, level: 1 })).toBeVisible();
      if (landing[role].heading === 'Today') await expect(page.getByText('Larchmere Joinery')).toBeVisible();
      await expect(page.getByRole('banner').getByText(demo[role].name)).toBeVisible();
      await expect(page.getByRole('banner').getByText(demo[role].roleLabel)).toBeVisible();

      const nav = mainNav(page);
      for (const label of navByRole[role].shown) await expect(nav.getByRole('link', { name: label, exact: true })).toBeVisible();
      for (const label of navByRole[role].hidden) await expect(nav.getByRole('link', { name: label, exact: true })).toHaveCount(0);
      await expect(nav.getByRole('link', { name: landing[role].nav, exact: true })).toHaveAttribute('aria-current', 'page');
    });
  }

  test('a wrong password shows the server’s message and stays on the sign-in page', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(demo.sprayer.email);
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toContainText('E-mail or password is wrong');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('a signed-out visitor is sent to sign in and then back to the page they wanted', async ({ page }) => {
    await page.goto('/racks');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fracks/);
    await page.getByLabel('E-mail').fill(demo.assembler.email);
    await page.getByLabel('Password', { exact: true }).fill(demoPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(/\/racks$/);
    await expect(page.getByRole('heading', { name: 'Racks', level: 1 })).toBeVisible();
    await expect(page.getByRole('cell', { name: 'Unheated' })).toBeVisible();
  });

  test('signing out returns to the sign-in page and closes the session', async ({ page }) => {
    await signIn(page, 'lead');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
    await page.goto('/booths');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fbooths/);
  });
});

test.describe('booths', () => {
  test('a lead adds a booth and sees it in the table', async ({ page }) => {
    const name = `Test booth ${Date.now()}`;
    await signIn(page, 'lead', '/booths');
    await expect(page.getByRole('table', { name: 'Booths' })).toBeVisible();
    await page.getByRole('button', { name: 'Add booth' }).click();

    const dialog = page.getByRole('dialog', { name: 'Add a booth' });
    await expect(dialog).toBeVisible();
    // The shared schema checks the form before anything is sent.
    await dialog.getByRole('button', { name: 'Save booth' }).click();
    await expect(dialog.getByText('Enter a name')).toBeVisible();

    await dialog.getByLabel('Name', { exact: true }).fill(name);
    await dialog.getByLabel('Kind').selectOption('down-draft');
    await dialog.getByLabel('Internal volume').fill('60');
    await dialog.getByLabel('Extraction rate').fill('18000');
    await dialog.getByLabel('Open-face area').fill('10');
    await dialog.getByRole('button', { name: 'Add opening hours' }).click();
    await dialog.getByRole('button', { name: 'Save booth' }).click();

    await expect(dialog).toBeHidden();
    await expect(page.getByText(`Booth “${name}” is added.`)).toBeVisible();
    const row = page.getByRole('row', { name: new RegExp(name) });
    await expect(row).toBeVisible();
    await expect(row).toContainText('Down-draft booth');
    await expect(row).toContainText('computed');
    await expect(row).toContainText('Sat 07:00–17:00');
  });

  test('a sprayer sees the booths table but no way to add or edit', async ({ page }) => {
    await signIn(page, 'sprayer', '/booths');
    await expect(page.getByRole('table', { name: 'Booths' })).toBeVisible();
    await expect(page.getByRole('row', { name: /Booth 1 \(cross-draft\)/ })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Add booth' })).toHaveCount(0);
    await expect(page.getByRole('button', { name: /^Edit / })).toHaveCount(0);
  });
});

test.describe('guards and unknown pages', () => {
  test('an assembler who types the calculator address is told it is not part of their role', async ({ page }) => {
    await signIn(page, 'assembler', '/calculator');
    await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
  });

  test('an unknown address shows the 404 page inside the app', async ({ page }) => {
    await signIn(page, 'sprayer', '/no-such-page');
    await expect(page.getByRole('heading', { name: 'No page here' })).toBeVisible();
    await expect(mainNav(page)).toBeVisible();
  });

  test('the admin sees the users with their roles', async ({ page }) => {
    await signIn(page, 'admin', '/settings/users');
    const table = page.getByRole('table', { name: 'Users' });
    await expect(table).toBeVisible();
    await expect(table.getByRole('row', { name: /Tomasz Brill/ })).toContainText('Assembler');
    await expect(page.getByRole('button', { name: 'Add user' })).toBeVisible();
  });
});

test('screenshots at desktop, tablet and phone widths', async ({ page }) => {
  fs.mkdirSync('/tmp/shots', { recursive: true });
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await page.screenshot({ path: '/tmp/shots/sign-in-1280.png' });
  await signIn(page, 'lead');

  const sizes = [
    { width: 1280, height: 800 },
    { width: 1024, height: 768 },
    { width: 390, height: 844 },
  ];
  for (const size of sizes) {
    await page.setViewportSize(size);
    await page.goto('/');
    await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
    await page.screenshot({ path: `/tmp/shots/today-${size.width}.png`, fullPage: true });
    await page.goto('/booths');
    await expect(page.getByRole('table', { name: 'Booths' })).toBeVisible();
    await page.screenshot({ path: `/tmp/shots/booths-${size.width}.png`, fullPage: true });
  }

  // Phone: the navigation folds behind a Menu button.
  const menu = page.getByRole('button', { name: 'Menu' });
  await expect(mainNav(page)).toBeHidden();
  await menu.click();
  await expect(page.getByRole('button', { name: 'Close menu' })).toHaveAttribute('aria-expanded', 'true');
  await expect(mainNav(page).getByRole('link', { name: 'Booths' })).toBeVisible();
  await page.screenshot({ path: '/tmp/shots/menu-390.png' });

  await page.setViewportSize({ width: 1024, height: 768 });
  await page.goto('/booths');
  await page.getByRole('button', { name: 'Add booth' }).click();
  await expect(page.getByRole('dialog', { name: 'Add a booth' })).toBeVisible();
  await page.screenshot({ path: '/tmp/shots/booth-form-1024.png' });
});
