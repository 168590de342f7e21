import type { Locator, Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { mainNav, signIn, type DemoRole } from './helpers';

/** What one report's JSON holds that the page shows as a key figure; the demo seed decides the values. */
interface ReportCheck {
  kind: string;
  tab: string;
  title: string;
  table: RegExp;
  empty: RegExp;
  /** The key figure's label and the value the API's answer says it must show. */
  figure: (report: Record<string, unknown>) => { label: string; value: string } | null;
}

type Rows = { rows: Record<string, number>[] };
const sum = (report: Record<string, unknown>, field: string) => (report as unknown as Rows).rows.reduce((total, row) => total + row[field], 0);
const kilograms = (kg: number) => `${new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 }).format(kg)} kg`;

const reports: ReportCheck[] = [
  { kind: 'booth-use', tab: 'Booth use', title: 'Booth use', table: /^Hours booked and sprayed/, empty: /No spray sessions in this range/, figure: (r) => ({ label: 'Spray sessions', value: String(sum(r, 'sessions')) }) },
  { kind: 'area-sprayed', tab: 'Area sprayed', title: 'Area sprayed', table: /^Area sprayed per week/, empty: /No coats sprayed in this range/, figure: (r) => ({ label: 'Coats', value: String(sum(r, 'coats')) }) },
  {
    kind: 'conditions',
    tab: 'Conditions',
    title: 'Conditions against limits',
    table: /^Conditions in .* per (hour|day)/,
    empty: /No readings or coats for/,
    figure: (r) => ({ label: 'Coats outside limits', value: String((r.coatsOutside as unknown[]).length) }),
  },
  { kind: 'solvent', tab: 'Solvent & VOC', title: 'Solvent and VOC', table: /^Solvent and VOC per month/, empty: /No mixes recorded in this range/, figure: (r) => ({ label: 'VOC in this range', value: kilograms(r.totalKg as number) }) },
  { kind: 'material', tab: 'Material', title: 'Material against estimate', table: /^Material per product/, empty: /No material mixed or estimated/, figure: (r) => ({ label: 'Jobs', value: String(new Set((r as unknown as Rows).rows.map((row) => row.jobId)).size) }) },
  { kind: 'rework', tab: 'Rework', title: 'Rework', table: /^Coats re-sprayed or corrected/, empty: /No coats corrected or re-sprayed/, figure: (r) => ({ label: 'Coats recorded', value: String(r.coatCount) }) },
];

const panel = (page: Page) => page.getByRole('tabpanel');
const keyFigure = (page: Page, label: string): Locator => panel(page).locator('dl > div').filter({ has: page.locator('dt', { hasText: label }) }).locator('dd');

/** The same report as JSON, through the page's own signed-in session, to know what the page must show. */
async function reportJson(page: Page, csvHref: string): Promise<Record<string, unknown>> {
  const response = await page.request.get(csvHref.replace('&format=csv', ''));
  expect(response.ok(), `GET ${csvHref}`).toBe(true);
  return (await response.json()).report;
}

async function checkReport(page: Page, check: ReportCheck) {
  await page.getByRole('tab', { name: check.tab }).click();
  await expect(page.getByRole('tab', { name: check.tab })).toHaveAttribute('aria-selected', 'true');
  await expect(page).toHaveURL(new RegExp(`report=${check.kind}`));
  await expect(panel(page).getByRole('heading', { level: 2 })).toContainText(check.title);

  const csv = page.getByRole('link', { name: 'Download CSV' });
  await expect(csv).toHaveAttribute('href', new RegExp(`^/api/reports/${check.kind}\\?from=\\d{4}-\\d{2}-\\d{2}&to=\\d{4}-\\d{2}-\\d{2}.*&format=csv$`));
  const href = (await csv.getAttribute('href'))!;

  const chart = panel(page).getByRole('img', { name: /chart/i });
  const empty = panel(page).getByText(check.empty);
  await expect(chart.or(empty).first()).toBeVisible();
  if (await empty.isVisible()) return;

  // The chart is drawn (its library loads on demand) and the table beside it carries the figures.
  await expect(chart.locator('svg.recharts-surface').first()).toBeVisible();
  await expect(panel(page).getByRole('table', { name: check.table })).toBeVisible();
  const figure = check.figure(await reportJson(page, href));
  if (figure) await expect(keyFigure(page, figure.label)).toHaveText(figure.value);
}

test.describe('reports', () => {
  test('a lead opens every report over the last 12 months, with a chart, a table and a CSV of the same range', async ({ page }) => {
    await signIn(page, 'lead');
    await mainNav(page).getByRole('link', { name: 'Reports', exact: true }).click();
    await expect(page.getByRole('heading', { name: 'Reports', level: 1 })).toBeVisible();
    // Opened without a range, a report covers the last four weeks, and the address names those days.
    await expect(page.getByRole('button', { name: 'Last 4 weeks' })).toHaveAttribute('aria-pressed', 'true');
    await expect(page).toHaveURL(/report=booth-use&from=\d{4}-\d{2}-\d{2}&to=\d{4}-\d{2}-\d{2}/);
    await expect(panel(page).getByRole('img', { name: /chart/i })).toBeVisible();

    await page.getByRole('button', { name: 'Last 12 months' }).click();
    await expect(page.getByRole('button', { name: 'Last 12 months' })).toHaveAttribute('aria-pressed', 'true');
    const from = await page.getByLabel('From', { exact: true }).inputValue();
    const to = await page.getByLabel('To', { exact: true }).inputValue();
    expect(from < to).toBe(true);
    for (const check of reports) {
      await checkReport(page, check);
      await expect(page.getByRole('link', { name: 'Download CSV' })).toHaveAttribute('href', new RegExp(`from=${from}&to=${to}`));
    }
  });

  test('the CSV link downloads the same table as a CSV attachment', async ({ page }) => {
    await signIn(page, 'lead', '/reports?report=solvent');
    const href = (await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href'))!;
    const response = await page.request.get(href);
    expect(response.status()).toBe(200);
    expect(response.headers()['content-type']).toMatch(/text\/csv/);
    expect(response.headers()['content-disposition']).toMatch(/^attachment/);
  });

  test('the range and options live in the address, so a link reopens the same report', async ({ page }) => {
    await signIn(page, 'lead', '/reports?report=area-sprayed&from=2026-01-01&to=2026-03-31&group=job');
    await expect(page.getByRole('tab', { name: 'Area sprayed' })).toHaveAttribute('aria-selected', 'true');
    await expect(page.getByLabel('From', { exact: true })).toHaveValue('2026-01-01');
    await expect(page.getByLabel('To', { exact: true })).toHaveValue('2026-03-31');
    await expect(page.getByLabel('Group the area by')).toHaveValue('job');
    await expect(panel(page).getByRole('heading', { level: 2 })).toHaveText('Area sprayed · 1 Jan 2026 – 31 Mar 2026');

    // A month from the month picker, then a range typed in.
    await page.getByLabel('Month', { exact: true }).fill('2026-02');
    await expect(page).toHaveURL(/from=2026-02-01&to=2026-02-28/);
    await expect(panel(page).getByRole('heading', { level: 2 })).toHaveText('Area sprayed · February 2026');
    await page.getByLabel('From', { exact: true }).fill('2026-02-10');
    await expect(page).toHaveURL(/from=2026-02-10&to=2026-02-28/);
    await expect(page.getByRole('link', { name: 'Download CSV' })).toHaveAttribute('href', '/api/reports/area-sprayed?from=2026-02-10&to=2026-02-28&groupBy=job&format=csv');

    // Arrow keys move between the report tabs.
    await page.getByRole('tab', { name: 'Area sprayed' }).focus();
    await page.keyboard.press('ArrowRight');
    await expect(page.getByRole('tab', { name: 'Conditions' })).toHaveAttribute('aria-selected', 'true');
    await expect(page.getByRole('tab', { name: 'Conditions' })).toBeFocused();
    await page.reload();
    await expect(page.getByRole('tab', { name: 'Conditions' })).toHaveAttribute('aria-selected', 'true');
    await expect(page.getByLabel('From', { exact: true })).toHaveValue('2026-02-10');
  });

  test('a range that ends before it starts is explained and nothing is fetched', async ({ page }) => {
    await signIn(page, 'lead', '/reports?report=rework&from=2026-05-01&to=2026-04-01');
    await expect(page.getByText('The end date is before the start date').first()).toBeVisible();
    await expect(page.getByRole('button', { name: 'Download CSV' })).toBeDisabled();
    await expect(page.getByRole('link', { name: 'Download CSV' })).toHaveCount(0);
  });

  test('the print layout drops the navigation and controls and keeps the shop, title, range, chart and table', async ({ page }) => {
    await signIn(page, 'lead', '/reports?report=booth-use');
    await page.getByRole('button', { name: 'Last 12 months' }).click();
    await expect(panel(page).getByRole('img', { name: /chart/i }).or(panel(page).getByText(/No spray sessions/)).first()).toBeVisible();
    await page.emulateMedia({ media: 'print' });
    await expect(mainNav(page)).toBeHidden();
    await expect(page.getByRole('tablist')).toBeHidden();
    await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
    await expect(panel(page).getByText('Larchmere Joinery')).toBeVisible();
    await expect(panel(page).getByRole('heading', { level: 2 })).toContainText('Booth use');
  });

  for (const role of ['sprayer', 'assembler'] as DemoRole[]) {
    test(`${role === 'assembler' ? 'an' : 'a'} ${role} has no Reports item, and the address shows the not-allowed page`, async ({ page }) => {
      await signIn(page, role);
      await expect(mainNav(page).getByRole('link', { name: 'Booths', exact: true })).toBeVisible();
      await expect(mainNav(page).getByRole('link', { name: 'Reports', exact: true })).toHaveCount(0);
      await page.goto('/reports?report=solvent');
      await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
      await expect(page.getByRole('tablist')).toHaveCount(0);
    });
  }

  test('the owner reads the solvent report with the yearly threshold', async ({ page }) => {
    await signIn(page, 'admin');
    await mainNav(page).getByRole('link', { name: 'Reports', exact: true }).click();
    await page.getByRole('tab', { name: 'Solvent & VOC' }).click();
    await page.getByRole('button', { name: 'This year' }).click();
    await expect(keyFigure(page, 'Yearly threshold').or(panel(page).getByText(/No mixes recorded/)).first()).toBeVisible();
  });
});
