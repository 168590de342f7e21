import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Page } from '@playwright/test';
import { expect, shotsDir, test } from './fixtures';
import { mainNav, signIn } from './helpers';

/** Cut lists from a spreadsheet: our own column names are not used, so every size column needs matching. */
function writeCsv(name: string, lines: string[]): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-cut-list-'));
  const file = path.join(dir, name);
  fs.writeFileSync(file, `${lines.join('\n')}\n`);
  return file;
}

const header = 'Part;L;W;T;Qty';
const goodRows = ['Side panel;900;560;18;2', 'Shelf;800;300;18;3'];

async function addJob(page: Page, reference: string, finishSystem: RegExp | null) {
  await page.getByRole('button', { name: 'Add job' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a job' });
  await dialog.getByLabel('Job reference').fill(reference);
  await dialog.getByLabel('Customer').fill('Fenwick Hall Joinery');
  await dialog.getByLabel('Due date').fill('2031-03-14');
  if (finishSystem) {
    const select = dialog.getByLabel('Finish system');
    const label = await select.locator('option', { hasText: finishSystem }).first().textContent();
    await select.selectOption({ label: label ?? '' });
  }
  await dialog.getByLabel('Colour').fill('Pale stone');
  await dialog.getByRole('button', { name: 'Save job' }).click();
  return dialog;
}

test.describe('jobs and parts', () => {
  // Each test signs in (a deliberately slow password hash) and walks several screens.
  test.describe.configure({ timeout: 60_000 });

  test('a lead sets up a job: a part by hand, a cut list from CSV, rack tags and the estimate', async ({ page }) => {
    const reference = `E2E-${Date.now()}`;
    await signIn(page, 'lead', '/jobs');
    await expect(mainNav(page).getByRole('link', { name: 'Jobs', exact: true })).toHaveAttribute('aria-current', 'page');

    await addJob(page, reference, /Painted MDF/);
    await expect(page.getByRole('heading', { name: `Job ${reference}`, level: 1 })).toBeVisible();
    await expect(page.getByText('Painted MDF, 2K PU satin')).toBeVisible();
    await expect(page.getByText('Add parts one at a time, or import the whole cut list')).toBeVisible();

    // One part by hand: both faces and all edges, 700 × 500 × 18, two pieces.
    await page.getByRole('button', { name: 'Add part' }).click();
    const partDialog = page.getByRole('dialog', { name: 'Add a part' });
    await partDialog.getByLabel('Label').fill('Door A');
    await partDialog.getByLabel('Length').fill('700');
    await partDialog.getByLabel('Width').fill('500');
    await partDialog.getByLabel('Thickness').fill('18');
    await partDialog.getByLabel('Quantity').fill('2');
    // (2 × 0.7 × 0.5) + 2 × (0.7 + 0.5) × 0.018 = 0.7432 m² a piece.
    await expect(partDialog.getByText('0.74 m² a piece, 1.49 m² for 2 pieces')).toBeVisible();
    await partDialog.getByRole('button', { name: 'Save part' }).click();
    await expect(partDialog).toBeHidden();
    const doorRow = page.getByRole('row', { name: /Door A/ });
    await expect(doorRow).toContainText('700 × 500 × 18');
    await expect(doorRow).toContainText('Both faces, all edges');
    await expect(doorRow).toContainText('0.74 m²');
    await expect(doorRow).toContainText('1.49 m²');
    const doorTag = (await doorRow.locator('.font-mono').textContent())?.replace(/\s/g, '') ?? '';
    expect(doorTag).toMatch(/^[A-Z2-9]{8}$/);

    // A cut list with a bad row: nothing may be imported.
    await page.getByRole('link', { name: 'Import cut list' }).click();
    await expect(page.getByRole('heading', { name: 'Import a cut list' })).toBeVisible();
    await page.getByLabel('CSV file').setInputFiles(writeCsv('bad-cut-list.csv', [header, ...goodRows, 'Drawer front;-5;140;18;1']));
    await expect(page.getByLabel('Label')).toHaveValue('Part');
    await expect(page.getByLabel('Quantity')).toHaveValue('Qty');
    await page.getByLabel('Length (mm)').selectOption('L');
    await page.getByLabel('Width (mm)').selectOption('W');
    await page.getByLabel('Thickness (mm)').selectOption('T');
    await expect(page.getByText('1 row needs fixing')).toBeVisible();
    await expect(page.getByRole('listitem').filter({ hasText: 'Row 4, length (mm): The length must be more than 0' })).toBeVisible();
    await expect(page.getByRole('row', { name: /Row 4/ })).toContainText('The length must be more than 0');
    await expect(page.getByRole('row', { name: /Row 2/ })).toContainText('Good');
    await expect(page.getByRole('button', { name: 'Import 3 parts' })).toBeDisabled();

    // The fixed file keeps the column matches and imports.
    await page.getByLabel('CSV file').setInputFiles(writeCsv('fixed-cut-list.csv', [header, ...goodRows, 'Drawer front;520;140;18;1']));
    await expect(page.getByText('Checked fixed-cut-list.csv.')).toBeVisible();
    await expect(page.getByText(/rows? needs? fixing/)).toHaveCount(0);
    await page.getByRole('button', { name: 'Import 3 parts' }).click();
    await expect(page.getByText(`3 parts imported into job ${reference}.`)).toBeVisible();
    await expect(page.getByRole('heading', { name: `Job ${reference}`, level: 1 })).toBeVisible();
    for (const label of ['Door A', 'Side panel', 'Shelf', 'Drawer front']) await expect(page.getByRole('row', { name: new RegExp(label) })).toBeVisible();
    const totals = page.getByLabel('Totals');
    await expect(totals).toContainText(/Part lines\s*4/);
    await expect(totals).toContainText(/Pieces\s*8/);
    await expect(totals).toContainText(/Coated area\s*[\d.]+ m²/);

    // The estimate follows the finish system's coats; a method change brings its transfer efficiency.
    const estimate = page.getByRole('region', { name: 'Material per coat step' });
    await expect(estimate.getByRole('row', { name: /Coat 1 of 3/ })).toContainText('Kestrel 2K PU Primer White');
    await expect(estimate.getByRole('row', { name: /Coat 3 of 3/ })).toContainText('Kestrel 2K PU Topcoat Satin');
    // Costs are in the shop's currency, written as its locale writes money.
    await expect(estimate.getByRole('row', { name: /All steps/ })).toContainText(/£\d+\.\d{2}/);
    await page.getByLabel('Spray method').selectOption('airless');
    await expect(page.getByLabel('Transfer efficiency')).toHaveValue('45');
    await expect(page.getByText(/at 45 % transfer efficiency \(Airless\)/)).toBeVisible();

    // Rack tags: one QR code per part line, and each code is a real image.
    await page.getByRole('link', { name: 'Rack tags' }).click();
    const tags = page.getByRole('list', { name: 'Rack tags' });
    const codes = tags.getByRole('img', { name: /QR code for part/ });
    await expect(codes).toHaveCount(4);
    for (const code of await codes.all()) expect(await code.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await expect(tags.getByRole('listitem').filter({ hasText: 'Door A' })).toContainText(`${doorTag.slice(0, 4)} ${doorTag.slice(4)}`);
    await expect(page.getByRole('button', { name: 'Print tags' })).toBeEnabled();

    // A tag typed in by hand (in lower case) finds its part, which links back to its job.
    await mainNav(page).getByRole('link', { name: 'Jobs', exact: true }).click();
    await page.getByLabel('Find a tag').fill(doorTag.toLowerCase());
    await page.getByRole('button', { name: 'Find part' }).click();
    await expect(page.getByRole('heading', { name: 'Door A', level: 1 })).toBeVisible();
    await expect(page.getByText('Both faces, all edges')).toBeVisible();
    await page.getByRole('link', { name: `Job ${reference}` }).click();
    await expect(page.getByRole('heading', { name: `Job ${reference}`, level: 1 })).toBeVisible();
  });

  test('a taken reference is refused beside the field, and a job with no finish system has no estimate', async ({ page }) => {
    await signIn(page, 'lead', '/jobs');
    const dialog = await addJob(page, 'LJ-26-101', null);
    await expect(dialog.getByLabel('Job reference')).toHaveAttribute('aria-invalid', 'true');
    await dialog.getByLabel('Job reference').fill(`E2E-NOSYS-${Date.now()}`);
    await dialog.getByRole('button', { name: 'Save job' }).click();
    await expect(page.getByText('No estimate yet')).toBeVisible();
    await expect(page.getByText(/has no finish system yet/)).toBeVisible();
  });

  test('an unknown tag says so', async ({ page }) => {
    await signIn(page, 'sprayer', '/jobs');
    await page.getByLabel('Find a tag').fill('zzzz 2222');
    await page.getByRole('button', { name: 'Find part' }).click();
    await expect(page.getByText('No part has the tag ZZZZ2222')).toBeVisible();
    await expect(page).toHaveURL(/\/jobs$/);
  });

  test('an assembler reads jobs and parts but has no controls to change them', async ({ page }) => {
    await signIn(page, 'assembler', '/jobs');
    await expect(page.getByRole('row', { name: /LJ-26-101/ })).toContainText('Hartfield Kitchen Co.');
    await expect(page.getByRole('button', { name: 'Add job' })).toHaveCount(0);

    await page.getByRole('link', { name: 'LJ-26-101' }).click();
    await expect(page.getByRole('heading', { name: 'Job LJ-26-101', level: 1 })).toBeVisible();
    await expect(page.getByRole('row', { name: /Door 1\b/ })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Rack tags' })).toBeVisible();
    for (const name of ['Edit job', 'Add part', /^Edit /]) await expect(page.getByRole('button', { name })).toHaveCount(0);
    await expect(page.getByRole('link', { name: 'Import cut list' })).toHaveCount(0);

    await page.goto(page.url().replace(/\/?$/, '/import'));
    await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
  });

  test('jobs move through their life cycle: the list filters by state, delivered jobs are never late, and a lead sets a state with an activity entry', async ({ page }) => {
    await signIn(page, 'lead', '/jobs');
    // The demo's past jobs had every part collected: delivered, and not overdue though their dates have passed.
    await page.getByLabel('State').selectOption({ label: 'Delivered (closed): every part collected' });
    await expect(page).toHaveURL(/state=delivered/);
    const past = page.getByRole('row', { name: /LJ-26-091/ });
    await expect(past).toContainText('Delivered');
    await expect(past).not.toContainText('Overdue');
    await expect(page.getByRole('row', { name: /LJ-26-101/ })).toHaveCount(0);
    await page.getByLabel('State').selectOption({ label: 'Not delivered yet (open, in finish, ready)' });
    await expect(page.getByRole('row', { name: /LJ-26-101/ })).toContainText('Open');
    await expect(page.getByRole('row', { name: /LJ-26-091/ })).toHaveCount(0);
    await page.getByLabel('State').selectOption({ label: 'Any state' });
    await expect(page.getByRole('row', { name: /LJ-26-091/ })).toBeVisible();
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.screenshot({ path: `${shotsDir}/jobs-states-1366.png`, fullPage: true });

    // A new job with one part: open, with the time it could be ready if sprayed now.
    const reference = `E2E-LIFE-${Date.now()}`;
    await addJob(page, reference, /Painted MDF/);
    await expect(page.getByRole('heading', { name: `Job ${reference}`, level: 1 })).toBeVisible();
    await page.getByRole('button', { name: 'Add part' }).click();
    const partDialog = page.getByRole('dialog', { name: 'Add a part' });
    await partDialog.getByLabel('Label').fill('Panel 1');
    await partDialog.getByLabel('Length').fill('700');
    await partDialog.getByLabel('Width').fill('500');
    await partDialog.getByLabel('Thickness').fill('18');
    await partDialog.getByRole('button', { name: 'Save part' }).click();
    await expect(partDialog).toBeHidden();
    const ready = page.getByRole('region', { name: 'When it is ready' });
    await expect(ready).toContainText(/Whole job ready to handle from about .+ \(in .+\)/);
    await expect(ready).toContainText('3 coats still to go on.');
    await expect(page.getByText('Follows its parts’ coats and collections')).toBeVisible();

    await page.getByRole('button', { name: 'Edit job' }).click();
    const dialog = page.getByRole('dialog', { name: `Edit job ${reference}` });
    await dialog.getByLabel('State').selectOption({ label: 'Cancelled' });
    await dialog.getByRole('button', { name: 'Save changes' }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByText('Set by a lead')).toBeVisible();
    await expect(ready).toHaveCount(0);
    await page.goto('/activity');
    await expect(page.getByText(`Set job ${reference} to cancelled (was open)`)).toBeVisible();
  });
});
