import type { Browser, Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { mainNav, signIn, type DemoRole } from './helpers';

// One shop, two sites: the admin adds Riverside works with a booth and a lead of its own. Each person
// gets their own browser context, so the sessions never mix.
const site = 'Riverside works';
const riversideBooth = 'Riverside booth';
const mainBooth = 'Booth 1 (cross-draft)';
const riversideLead = { name: 'Ravi Okafor', email: 'lead.riverside@larchmere.test', password: 'riverside-lead-2026' };

test.describe.configure({ mode: 'serial' });

async function pageFor(browser: Browser, role: DemoRole | typeof riversideLead, path: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  if (typeof role === 'string') {
    await signIn(page, role, path);
    return page;
  }
  await page.goto(path);
  await page.getByLabel('E-mail').fill(role.email);
  await page.getByLabel('Password', { exact: true }).fill(role.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(mainNav(page)).toBeVisible();
  return page;
}

const boothRows = (page: Page) => page.getByRole('region', { name: 'Booths' }).getByRole('row');
const boothChoice = (page: Page) => page.getByRole('dialog', { name: 'Book a spray session' }).getByLabel('Booth');

async function openBookingForm(page: Page) {
  await page.goto('/planner');
  await page.getByRole('button', { name: 'Book a session' }).click();
  return boothChoice(page);
}

test('an admin adds a site, puts a booth and a lead there, and each lead plans only their own site', async ({ browser }) => {
  // Three people sign in and the admin goes round most of the app: longer than one page's worth.
  test.setTimeout(120_000);
  const admin = await pageFor(browser, 'admin', '/');
  // One site so far: nothing about sites on the Booths page.
  await mainNav(admin).getByRole('link', { name: 'Booths' }).click();
  await expect(boothRows(admin).first()).toBeVisible();
  await expect(admin.getByRole('columnheader', { name: 'Site' })).toHaveCount(0);
  await expect(admin.getByLabel('Site', { exact: true })).toHaveCount(0);

  await mainNav(admin).getByRole('link', { name: 'Sites' }).click();
  await expect(admin.getByRole('heading', { name: 'Sites', level: 1 })).toBeVisible();
  await admin.getByRole('button', { name: 'Add site' }).click();
  const addSite = admin.getByRole('dialog', { name: 'Add a site' });
  await addSite.getByLabel('Name').fill('Main site');
  await addSite.getByRole('button', { name: 'Save site' }).click();
  await expect(addSite.getByText('Already in use')).toBeVisible();
  await addSite.getByLabel('Name').fill(site);
  await addSite.getByRole('button', { name: 'Save site' }).click();
  await expect(addSite).toBeHidden();
  await expect(admin.getByRole('row', { name: new RegExp(site) })).toBeVisible();

  await mainNav(admin).getByRole('link', { name: 'Booths' }).click();
  await admin.getByRole('button', { name: 'Add booth' }).click();
  const addBooth = admin.getByRole('dialog', { name: 'Add a booth' });
  await addBooth.getByLabel('Name', { exact: true }).fill(riversideBooth);
  await expect(addBooth.getByLabel('Site')).toHaveValue('1');
  await addBooth.getByLabel('Site').selectOption({ label: site });
  await addBooth.getByLabel('Internal volume').fill('60');
  await addBooth.getByLabel('Extraction rate').fill('12000');
  await addBooth.getByRole('button', { name: 'Save booth' }).click();
  await expect(addBooth).toBeHidden();
  await expect(admin.getByRole('row', { name: new RegExp(riversideBooth) })).toContainText(site);

  await mainNav(admin).getByRole('link', { name: 'Users' }).click();
  await admin.getByRole('button', { name: 'Add user' }).click();
  const addUser = admin.getByRole('dialog', { name: 'Add a user' });
  await addUser.getByLabel('Name', { exact: true }).fill(riversideLead.name);
  await addUser.getByLabel('E-mail').fill(riversideLead.email);
  await addUser.getByLabel('Role').selectOption('lead');
  await addUser.getByLabel('Site').selectOption({ label: site });
  await addUser.getByLabel('First password').fill(riversideLead.password);
  await addUser.getByRole('button', { name: 'Save user' }).click();
  await expect(addUser).toBeHidden();
  await expect(admin.getByRole('row', { name: new RegExp(riversideLead.name) })).toContainText(site);

  // The Riverside lead sees Riverside only, and has no site controls (the server keeps them there).
  const ravi = await pageFor(browser, riversideLead, '/booths');
  await expect(boothRows(ravi)).toHaveCount(2);
  await expect(ravi.getByRole('row', { name: new RegExp(riversideBooth) })).toBeVisible();
  await expect(ravi.getByLabel('Site', { exact: true })).toHaveCount(0);
  await expect(await openBookingForm(ravi)).toHaveText(riversideBooth);

  // The demo lead, at the main site, never sees the Riverside booth.
  const dev = await pageFor(browser, 'lead', '/booths');
  await expect(dev.getByRole('row', { name: new RegExp(mainBooth.replace(/[()]/g, '\\$&')) })).toBeVisible();
  await expect(dev.getByRole('row', { name: new RegExp(riversideBooth) })).toHaveCount(0);
  const devChoice = await openBookingForm(dev);
  await expect(devChoice.getByRole('option', { name: mainBooth })).toHaveCount(1);
  await expect(devChoice.getByRole('option', { name: riversideBooth })).toHaveCount(0);

  // The admin sees both sites, or one through the switcher.
  await mainNav(admin).getByRole('link', { name: 'Booths' }).click();
  await expect(admin.getByRole('row', { name: new RegExp(riversideBooth) })).toBeVisible();
  await expect(admin.getByRole('row', { name: /Booth 1 \(cross-draft\)/ })).toBeVisible();
  await admin.getByLabel('Site', { exact: true }).selectOption({ label: site });
  await expect(admin).toHaveURL(/[?&]site=\d+/);
  await expect(boothRows(admin)).toHaveCount(2);
  await expect(admin.getByRole('row', { name: new RegExp(riversideBooth) })).toBeVisible();

  await mainNav(admin).getByRole('link', { name: 'Booth planner' }).click();
  await expect(admin.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();
  await admin.getByLabel('Site', { exact: true }).selectOption({ label: site });
  await admin.getByRole('button', { name: 'Book a session' }).click();
  await expect(boothChoice(admin)).toHaveText(riversideBooth);
  await admin.getByRole('dialog', { name: 'Book a spray session' }).getByRole('button', { name: 'Cancel' }).click();
  await admin.getByLabel('Site', { exact: true }).selectOption({ label: 'All sites' });
  await admin.getByRole('button', { name: 'Book a session' }).click();
  await expect(boothChoice(admin).getByRole('option', { name: riversideBooth })).toHaveCount(1);
  await expect(boothChoice(admin).getByRole('option', { name: mainBooth })).toHaveCount(1);
});

test('the Sites page and a booth form with its Site select, at 1280 wide', async ({ browser }) => {
  const admin = await pageFor(browser, 'admin', '/settings/sites');
  // Booths, racks and people at each site.
  await expect(admin.getByRole('row', { name: new RegExp(site) }).getByRole('cell')).toHaveText(['1', '0', '1', 'Rename']);
  await expect(admin.getByRole('row', { name: /Main site \(your site\)/ })).toBeVisible();
  await admin.screenshot({ path: '/tmp/h-sites/shots/sites-page-1280.png', fullPage: true });
  await admin.getByRole('button', { name: `Rename ${site}` }).click();
  await expect(admin.getByRole('dialog', { name: `Rename ${site}` }).getByLabel('Name')).toHaveValue(site);
  await admin.getByRole('dialog', { name: `Rename ${site}` }).getByRole('button', { name: 'Cancel' }).click();

  await admin.goto('/booths');
  await admin.getByRole('button', { name: 'Add booth' }).click();
  await expect(admin.getByRole('dialog', { name: 'Add a booth' }).getByLabel('Site')).toBeVisible();
  await admin.screenshot({ path: '/tmp/h-sites/shots/booth-form-site-1280.png' });
});
