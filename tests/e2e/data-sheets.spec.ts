import type { Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { mainNav, signIn } from './helpers';

// The smallest file the server accepts as a PDF: it checks the "%PDF-" header, not the extension.
const tinyPdf = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1');

type DryingRow = [flashOff: string, recoatFrom: string, recoatUntil: string, touchDry: string, handle: string, pack: string, fullCure: string];
// Times in minutes are typed in the unit shown beside each box (minutes unless chosen otherwise).
const dryingColumns = ['Flash-off', 'Recoat from', 'Recoat until', 'Touch dry', 'Handle', 'Pack', 'Full cure (h)'];

async function fillDryingRow(page: Page, row: number, tempC: string, values: DryingRow) {
  await page.getByLabel(`Temperature (°C), row ${row}`).fill(tempC);
  for (const [index, column] of dryingColumns.entries()) await page.getByLabel(`${column}, row ${row}`, { exact: true }).fill(values[index]);
}

test.describe('data sheets', () => {
  test('a lead adds a data sheet, fixes a drying-table error beside its cell, attaches a PDF and adds lots', async ({ page }) => {
    test.slow(); // one long flow through three forms and an upload
    const name = `Test Satin Lacquer ${Date.now()}`;
    await signIn(page, 'lead', '/data-sheets');
    await page.getByRole('link', { name: 'Add data sheet' }).click();
    await expect(page.getByRole('heading', { name: 'New data sheet' })).toBeVisible();

    await page.getByLabel('Product name').fill(name);
    await page.getByLabel('Kind').selectOption('topcoat');
    await page.getByLabel('Chemistry').selectOption('water-borne');
    await page.getByLabel('Volume solids').fill('35');
    await page.getByLabel('Dry film per coat').fill('40');
    await page.getByLabel('Flammable').check();
    await fillDryingRow(page, 1, '20', ['10', '60', '240', '20', '120', '480', '168']);
    await page.getByRole('button', { name: 'Add a temperature row' }).click();
    // Latest recoat (100) before the earliest (120): a slip the schema catches on that very cell.
    await fillDryingRow(page, 2, '10', ['20', '120', '100', '40', '240', '960', '336']);
    await page.getByRole('button', { name: 'Save data sheet' }).click();

    const recoatUntil = page.getByLabel('Recoat until, row 2', { exact: true });
    await expect(recoatUntil).toHaveAttribute('aria-invalid', 'true');
    const cell = page.getByRole('cell').filter({ has: recoatUntil });
    await expect(cell).toContainText('The latest recoat time cannot be before the earliest');
    await expect(page.getByLabel('Recoat until, row 1', { exact: true })).toHaveAttribute('aria-invalid', 'false');
    await expect(page).toHaveURL(/\/data-sheets\/new$/);

    await recoatUntil.fill('480');
    await page.getByRole('button', { name: 'Save data sheet' }).click();
    await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
    await expect(page).toHaveURL(/\/data-sheets\/\d+$/);
    // No thinning range was typed: the saved sheet opens with both boxes still blank (no thinning check), not 0–0 %.
    await expect(page.getByLabel('Thinner, least')).toHaveValue('');
    await expect(page.getByLabel('Thinner, most')).toHaveValue('');

    // Halfway between the two rows the times are interpolated, and the page says so.
    const preview = page.getByRole('region', { name: 'Drying at another temperature' });
    await preview.getByLabel('Drying temperature').fill('15');
    await expect(preview).toContainText('Interpolated between the two data-sheet rows');
    await expect(preview).toContainText('1 h 25 min'); // recoat opens: √(60 × 120) = 84.9 min
    await preview.getByLabel('Drying temperature').fill('5');
    await expect(preview).toContainText('Extrapolated beyond');

    const documents = page.getByRole('region', { name: 'Documents' });
    await documents.getByLabel('Attach the SDS (PDF, up to 20 MB)').setInputFiles({ name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a pdf') });
    await documents.getByRole('button', { name: 'Upload SDS' }).click();
    await expect(documents.getByText('Only PDF files are accepted')).toBeVisible();
    await documents.getByLabel('Attach the TDS (PDF, up to 20 MB)').setInputFiles({ name: 'test-satin-tds.pdf', mimeType: 'application/pdf', buffer: tinyPdf });
    await documents.getByRole('button', { name: 'Upload TDS' }).click();
    await expect(documents.getByRole('link', { name: 'Download test-satin-tds.pdf' })).toHaveAttribute('href', /\/api\/files\/\d+/);

    const lots = page.getByRole('region', { name: 'Lots' });
    await lots.getByLabel('Lot number').fill('T-2040-A');
    await lots.getByLabel('Expires on').fill('2040-01-31');
    await lots.getByRole('button', { name: 'Add lot' }).click();
    await expect(lots.getByRole('row', { name: /T-2040-A/ })).toContainText('In date');
    await lots.getByLabel('Lot number').fill('T-2019-B');
    await lots.getByLabel('Expires on').fill('2019-06-30');
    await lots.getByRole('button', { name: 'Add lot' }).click();
    await expect(lots.getByRole('row', { name: /T-2019-B/ })).toContainText('Expired');

    await page.getByRole('link', { name: 'All data sheets' }).click();
    await page.getByLabel('Search by name or maker’s reference').fill(name);
    const row = page.getByRole('row', { name: new RegExp(name) });
    await expect(row).toContainText('T-2019-B');
    await expect(row).toContainText('Expired');
    await expect(row).toContainText('Flammable');
    await expect(row.getByRole('link', { name: /technical data sheet/ })).toBeVisible();
    await expect(page.getByRole('table', { name: 'Data sheets' }).getByRole('row')).toHaveCount(2);
  });

  test('the table searches and sorts on the server', async ({ page }) => {
    await signIn(page, 'lead', '/data-sheets');
    const table = page.getByRole('table', { name: 'Data sheets' });
    await page.getByLabel('Search by name or maker’s reference').fill('kf-ss');
    await expect(table.getByRole('row')).toHaveCount(2);
    await expect(table).toContainText('Kestrel Sanding Sealer NC');
    await page.getByLabel('Search by name or maker’s reference').fill('');

    await page.getByRole('button', { name: /^Kind/ }).click();
    await expect(page.getByRole('columnheader', { name: /Kind/ })).toHaveAttribute('aria-sort', 'ascending');
    await expect(table.getByRole('row').nth(1).getByRole('cell').first()).toHaveText('Clear');
    await page.getByRole('button', { name: /^Kind/ }).click();
    await expect(page.getByRole('columnheader', { name: /Kind/ })).toHaveAttribute('aria-sort', 'descending');
    await expect(table.getByRole('row').nth(1).getByRole('cell').first()).toHaveText('Undercoat');
  });

  test('a lead builds a finish system of a coat, a denib and a coat, and sees its totals', async ({ page }) => {
    test.slow(); // a long dialog flow: three steps, a reorder both ways, totals, save
    const name = `Test two-coat WB ${Date.now()}`;
    await signIn(page, 'lead', '/finish-systems');
    await page.getByRole('button', { name: 'Add finish system' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a finish system' });
    await dialog.getByLabel('Name', { exact: true }).fill(name);

    await dialog.getByRole('button', { name: 'Add coat' }).click();
    await dialog.getByLabel('Product, step 1').selectOption({ label: 'Kestrel AquaPrime WB primer (KF-WP-210)' });
    await expect(dialog.getByLabel('Dry film target, step 1')).toHaveValue('40');
    await dialog.getByRole('button', { name: 'Add coat' }).click();
    await dialog.getByLabel('Product, step 2').selectOption({ label: 'Kestrel AquaTop WB Topcoat Satin (KF-WT-330)' });
    await expect(dialog.getByLabel('Dry film target, step 2')).toHaveValue('35');
    await dialog.getByRole('button', { name: 'Add denib step' }).click();
    await expect(dialog.getByLabel('Grit, step 3')).toHaveValue('P320');

    // The denib belongs between the coats: move it up by keyboard-reachable buttons.
    await dialog.getByRole('button', { name: 'Move step 3 up' }).click();
    await expect(dialog.getByText('Step 2: denib')).toBeVisible();
    await expect(dialog.getByText('Step 3: coat 2 of 2')).toBeVisible();
    await expect(dialog.getByRole('button', { name: 'Move step 2 up' })).toBeFocused();
    // Dragging by the grip works too: drop the denib on step 1, then put it back with the keyboard.
    // Scrolling in the middle of a drag would cancel it, so both ends are brought into view first.
    await dialog.getByText('Step 1: coat 1 of 2').scrollIntoViewIfNeeded();
    await dialog.getByTitle('Drag to move this step').nth(1).dragTo(dialog.getByText('Step 1: coat 1 of 2'));
    await expect(dialog.getByText('Step 1: denib')).toBeVisible();
    await dialog.getByRole('button', { name: 'Move step 1 down' }).click();
    await expect(dialog.getByText('Step 2: denib')).toBeVisible();
    await expect(dialog.getByLabel('Product, step 3').locator('option:checked')).toHaveText('Kestrel AquaTop WB Topcoat Satin (KF-WT-330)');

    // At 20 °C both products have an exact row: primer recoat 60 + denib 15 + topcoat pack 480 = 555 min.
    // Litres: 40 / (38 × 10) + 35 / (34 × 10) = 0.1053 + 0.1029 = 0.208 L/m².
    const totals = dialog.getByRole('region', { name: 'Totals for these steps' });
    await totals.getByLabel('Drying temperature').fill('20');
    await expect(totals).toContainText('Coats2');
    await expect(totals).toContainText('0.208 L per m²');
    await expect(totals).toContainText('before transfer losses');
    await expect(totals).toContainText('9 h 15 min');
    await expect(totals).toContainText('Denib with P320: 15 min allowed');
    await expect(totals).not.toContainText(/abrade/i);

    await dialog.getByRole('button', { name: 'Save finish system' }).click();
    await expect(dialog).toBeHidden();
    await page.getByLabel('Drying temperature for the times below').fill('20');
    const card = page.getByRole('article', { name });
    await expect(card.getByRole('listitem')).toHaveText([/Coat 1 of 2:.*AquaPrime/, /Denib with P320/, /Coat 2 of 2:.*AquaTop/]);
    await expect(card).toContainText('9 h 15 min');
  });

  test('a lead types a 16 h recoat as 16 hours; it is stored in minutes and reads back as 16 h', async ({ page }) => {
    const name = `Test Hours Lacquer ${Date.now()}`;
    await signIn(page, 'lead', '/data-sheets/new');
    await page.getByLabel('Product name').fill(name);
    await page.getByLabel('Kind').selectOption('topcoat');
    await page.getByLabel('Chemistry').selectOption('solvent-borne');
    await page.getByLabel('Volume solids').fill('30');
    await fillDryingRow(page, 1, '20', ['10', '2', '16', '20', '3', '8', '168']);
    const unit = (column: string) => page.getByLabel(`${column} unit, row 1`, { exact: true });
    for (const column of ['Recoat from', 'Recoat until', 'Handle', 'Pack']) await unit(column).selectOption({ label: 'hours' });
    await page.getByLabel('Pot life', { exact: true }).fill('4');
    await page.getByLabel('Pot life unit', { exact: true }).selectOption({ label: 'hours' });
    // What is added here is big enough for a gloved finger.
    for (const box of [unit('Recoat until'), page.getByLabel('Recoat until, row 1', { exact: true })]) expect((await box.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await page.getByRole('button', { name: 'Save data sheet' }).click();
    await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();

    // Stored in minutes, as the API has always answered: 16 h = 960 min, 2 h = 120, 3 h = 180, 8 h = 480, pot life 4 h = 240.
    const id = /\/data-sheets\/(\d+)$/.exec(page.url())![1];
    const { product } = await (await page.request.get(`/api/products/${id}`)).json();
    expect(product.potLifeMin).toBe(240);
    expect(product.dryingTimes[0]).toMatchObject({ flashOffMin: 10, recoatMinMin: 120, recoatMaxMin: 960, touchDryMin: 20, handleMin: 180, packMin: 480, fullCureH: 168 });

    // Opened again, each time reads in the unit that suits it.
    await page.reload();
    await expect(page.getByLabel('Recoat until, row 1', { exact: true })).toHaveValue('16');
    await expect(unit('Recoat until')).toHaveValue('h');
    await expect(page.getByLabel('Recoat from, row 1', { exact: true })).toHaveValue('2');
    await expect(page.getByLabel('Flash-off, row 1', { exact: true })).toHaveValue('10');
    await expect(unit('Flash-off')).toHaveValue('min');
    await expect(page.getByLabel('Pot life', { exact: true })).toHaveValue('4');
    await expect(page.getByLabel('Pot life unit', { exact: true })).toHaveValue('h');
    const preview = page.getByRole('region', { name: 'Drying at another temperature' });
    await preview.getByLabel('Drying temperature').fill('20');
    await expect(preview.getByText('Recoat window closes').locator('..')).toContainText('16 h');
  });

  test('a sprayer reads data sheets but cannot change them', async ({ page }) => {
    await signIn(page, 'sprayer', '/data-sheets');
    await expect(page.getByRole('table', { name: 'Data sheets' })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Add data sheet' })).toHaveCount(0);
    await page.getByRole('link', { name: 'Kestrel 2K PU Topcoat Satin', exact: true }).click();
    await expect(page.getByRole('heading', { name: 'Kestrel 2K PU Topcoat Satin', level: 1 })).toBeVisible();
    await expect(page.getByRole('table', { name: 'Drying times at each temperature on the data sheet' })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Download kestrel-pu-topcoat-tds.pdf' })).toBeVisible();
    await expect(page.getByRole('textbox')).toHaveCount(1); // only the preview's temperature
    await expect(page.getByRole('button', { name: /Save|Upload|Add lot/ })).toHaveCount(0);

    await page.goto('/data-sheets/new');
    await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
  });

  test('an assembler has no Data sheets in the navigation and is turned away from the page', async ({ page }) => {
    await signIn(page, 'assembler', '/');
    await expect(mainNav(page).getByRole('link', { name: 'Finish systems' })).toBeVisible();
    await expect(mainNav(page).getByRole('link', { name: 'Data sheets' })).toHaveCount(0);
    await page.goto('/data-sheets');
    await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
  });
});
