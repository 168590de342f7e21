import { expect, shotsDir, test } from './fixtures';
import { mainNav, signIn } from './helpers';

test.describe('at 1024 × 768, a small laptop or a tablet held landscape', () => {
  test.use({ viewport: { width: 1024, height: 768 } });

  test('the navigation folds into a menu button that works from the keyboard, and Escape closes it', async ({ page }) => {
    await signIn(page, 'lead', '/data-sheets');
    await expect(page.getByRole('heading', { name: 'Data sheets', level: 1 })).toBeVisible();
    await expect(mainNav(page)).toBeHidden();
    const menu = page.getByRole('button', { name: 'Menu' });
    await expect(menu).toHaveAttribute('aria-expanded', 'false');
    await page.screenshot({ path: `${shotsDir}/layout-1024-data-sheets.png` });

    await menu.focus();
    await page.keyboard.press('Enter');
    await expect(mainNav(page)).toBeVisible();
    await expect(mainNav(page).getByRole('link', { name: 'Today' })).toBeFocused();
    await page.screenshot({ path: `${shotsDir}/layout-1024-menu-open.png` });
    await page.keyboard.press('Escape');
    await expect(mainNav(page)).toBeHidden();
    await expect(page.getByRole('button', { name: 'Menu' })).toBeFocused();

    // Opened again and a page chosen: the menu closes and the page opens.
    await page.keyboard.press('Enter');
    await mainNav(page).getByRole('link', { name: 'Jobs', exact: true }).click();
    await expect(page.getByRole('heading', { name: 'Jobs', level: 1 })).toBeVisible();
    await expect(mainNav(page)).toBeHidden();
  });
});

test.describe('at 1366 × 768, the usual laptop', () => {
  test.use({ viewport: { width: 1366, height: 768 } });

  test('the sidebar stays open and the data-sheets table fits beside it, badges and all', async ({ page }) => {
    await signIn(page, 'lead', '/data-sheets');
    await expect(mainNav(page)).toBeVisible();
    await expect(page.getByRole('button', { name: 'Menu' })).toBeHidden();
    const region = page.getByRole('region', { name: 'Data sheets' });
    const badge = region.getByText('Expired', { exact: true }).first();
    await expect(badge).toBeVisible();
    await page.screenshot({ path: `${shotsDir}/layout-1366-data-sheets.png` });

    const fit = await region.evaluate((element) => ({ scroll: element.scrollWidth, client: element.clientWidth }));
    expect(fit.scroll, 'the table needs no sideways scrolling').toBeLessThanOrEqual(fit.client);
    const [area, mark] = [await region.boundingBox(), await badge.boundingBox()];
    expect(mark!.x + mark!.width).toBeLessThanOrEqual(area!.x + area!.width);
  });
});
