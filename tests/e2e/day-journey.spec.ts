import type { Browser, Page } from '@playwright/test';
import { expect, shotsDir, test } from './fixtures';
import { mainNav, signIn } from './helpers';
import { clearSpan, demoShop, leadApi } from './lead-api';
import { addDataSheet, addFinishSystem, addJob, bookByDraggingNow, type DryingRow } from './day-journey-lead';
import { coatCards, coatForm, latestCoatTime, recordCoat, recordDenib, recordMix, runChecklist, stopSpraying, tap } from './day-journey-sprayer';

// The day as three people live it, each in their own browser at once, through the screens only.
const shopZone = 'Europe/London';
const stamp = Date.now().toString(36).toUpperCase();
const reference = `DAY-${stamp}`;
const customer = 'Dayrun Interiors';
const primer = `Dayrun primer ${stamp}`;
const topcoat = `Dayrun topcoat ${stamp}`;
const system = `Dayrun primer and topcoat ${stamp}`;
const parts = [
  { label: `Door ${stamp}`, lengthMm: 715, widthMm: 496, shelf: 11 },
  { label: `Drawer front ${stamp}`, lengthMm: 496, widthMm: 140, shelf: 12 },
];
const dueDate = new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
// Water-borne coats with drying times of seconds at 20 °C: the test waits only as these sheets say.
const quickDrying: DryingRow = { flashOff: 0.25, recoatFrom: 0.5, recoatUntil: 240, touchDry: 0.5, handle: 0.5, pack: 1, fullCureH: 1 };

/** A part's card on the ready board. */
const card = (page: Page, label: string) => page.getByRole('listitem', { name: new RegExp(`^${label}, `) });

/** The lead at a desk, the sprayer on the booth's tablet, the assembler on a phone. */
async function openScreens(browser: Browser): Promise<[Page, Page, Page]> {
  const lead = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const sprayer = await browser.newContext({ viewport: { width: 1024, height: 768 }, hasTouch: true });
  const assembler = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
  return [await lead.newPage(), await sprayer.newPage(), await assembler.newPage()];
}

test('a lead plans, a sprayer sprays and an assembler collects a job in one day, each on their own screen', async ({ browser, baseURL }) => {
  test.setTimeout(240_000);
  const [lead, sprayer, assembler] = await openScreens(browser);

  // The lead sets up the job from nothing: two data sheets, the system, the job and its parts.
  await signIn(lead, 'lead', '/');
  await addDataSheet(lead, { name: primer, kind: 'Primer', dryFilmUm: 35, drying: quickDrying });
  await addDataSheet(lead, { name: topcoat, kind: 'Topcoat', dryFilmUm: 40, drying: quickDrying });
  await addFinishSystem(lead, system, primer, topcoat);
  await addJob(lead, { reference, customer, dueDate, system, colour: 'Chalk white' }, parts);

  // The primer by dragging across free booth time now in the week view, the topcoat by auto-plan.
  // The demo week keeps the booths and Mina busy through working hours: the lead makes room first.
  const api = await leadApi(baseURL!);
  await clearSpan(api, { start: new Date(Date.now() - 20 * 60_000).toISOString(), end: new Date(Date.now() + 2 * 3_600_000).toISOString() }, await demoShop(api));
  await api.context.dispose();
  await mainNav(lead).getByRole('link', { name: 'Booth planner' }).click();
  await expect(lead.getByRole('button', { name: 'Week', pressed: true })).toBeVisible();
  const booth = await bookByDraggingNow(lead, shopZone, ['Booth 1 (cross-draft)', 'Back spray room'], { reference, customer });
  await lead.getByRole('button', { name: 'Auto-plan jobs' }).click();
  const autoPlan = lead.getByRole('dialog', { name: 'Auto-plan jobs' });
  await autoPlan.getByRole('checkbox', { name: new RegExp(reference) }).check();
  await autoPlan.getByRole('button', { name: 'Propose a plan' }).click();
  const proposed = autoPlan.getByRole('table', { name: 'Proposed spray sessions' });
  await expect(proposed.getByRole('row')).toHaveCount(2);
  await expect(proposed).toContainText(topcoat);
  await expect(autoPlan.getByRole('list', { name: 'Jobs in the proposal' })).toContainText(`Coat 1 of 2 (${primer}) is already booked`);
  await autoPlan.getByRole('button', { name: 'Book this session' }).click();
  await expect(lead.getByText('Booked 1 spray session')).toBeVisible();

  // Today: the primer session has no sprayer yet; the lead gives it to Mina on the spot.
  await mainNav(lead).getByRole('link', { name: 'Today', exact: true }).click();
  const row = lead.getByRole('region', { name: booth, exact: true }).getByRole('listitem').filter({ hasText: `${reference} · coat 1 of 2` });
  await expect(row).toContainText('No sprayer yet');
  await row.getByLabel(/^Sprayer for/).selectOption({ label: 'Mina Castell' });
  await expect(lead.getByText(/^Mina Castell sprays /)).toBeVisible();
  await expect(row).not.toContainText('No sprayer yet');
  await lead.screenshot({ path: `${shotsDir}/day-today-lead-1366.png`, fullPage: true });

  // The assembler lands on the ready board and watches the job from before its first coat.
  await signIn(assembler, 'assembler', '/');
  await expect(assembler.getByRole('heading', { name: 'Ready board', level: 1 })).toBeVisible();
  await assembler.getByLabel('Job').selectOption({ label: `${reference} · ${customer}` });
  const jobTime = assembler.getByRole('group', { name: `When ${reference} is ready` });
  await expect(jobTime).toContainText(/Whole job ready to handle from about/);
  for (const part of parts) await expect(card(assembler, part.label)).toContainText('No coats yet (2 to go)');
  await assembler.evaluate(() => Object.assign(window, { boardNotReloaded: true }));

  // The sprayer opens the session from Today on the booth tablet: checks, a pot, the primer.
  await signIn(sprayer, 'sprayer', '/');
  const mine = sprayer.getByRole('region', { name: 'My sessions today' }).getByRole('listitem').filter({ hasText: reference }).filter({ has: sprayer.getByRole('link', { name: 'Open the session' }) });
  await expect(mine).toContainText('Next: Run the pre-spray checklist');
  await tap(mine.getByRole('link', { name: 'Open the session' }));
  await runChecklist(sprayer);
  await recordMix(sprayer, primer);
  await expect(coatForm(sprayer).getByRole('list', { name: 'Chosen parts' }).getByRole('listitem')).toHaveCount(2);
  await expect(coatForm(sprayer)).not.toContainText('induction');
  await recordCoat(sprayer, 90, 0);
  for (const part of parts) await expect(card(assembler, part.label)).toContainText('1 of 2 coats on');

  // Denib, then the topcoat in the same session once the primer's recoat window opens.
  await recordDenib(sprayer, 2);
  await tap(coatForm(sprayer).getByRole('button', { name: 'Tick all 2' }));
  await expect(coatForm(sprayer).getByLabel('Coat', { exact: true }).locator('option:checked')).toHaveText(new RegExp(`^Coat 2 of 2: ${topcoat}`));
  await recordMix(sprayer, topcoat);
  await expect(coatForm(sprayer).getByLabel('Mix (pot)').locator('option:checked')).toHaveText(/ mixed at \d{2}:\d{2}, 1\.50 L$/);
  // The stop stands until the window opens, and goes by itself: the only wait is the data sheet's.
  await expect(coatForm(sprayer).getByText(/not ready to recoat until/)).toBeHidden({ timeout: 60_000 });
  await recordCoat(sprayer, 100, 1);
  await expect(coatCards(sprayer).first()).toContainText(topcoat);
  const handleFrom = await latestCoatTime(sprayer, 'Handle from');
  await sprayer.screenshot({ path: `${shotsDir}/day-session-1024.png`, fullPage: true });
  await stopSpraying(sprayer);

  // The lead follows the job; the assembler's board follows the coats without a reload.
  await mainNav(lead).getByRole('link', { name: 'Jobs', exact: true }).click();
  await lead.getByRole('link', { name: reference }).click();
  await expect(lead.getByRole('heading', { name: `Job ${reference}`, level: 1 })).toBeVisible();
  await expect(jobTime).toContainText(`Whole job ready to handle at ${handleFrom}`);
  for (const part of parts) await expect(card(assembler, part.label)).toContainText('2 of 2 coats on');
  await assembler.screenshot({ path: `${shotsDir}/day-ready-390.png` });
  for (const part of parts) {
    const collect = card(assembler, part.label).getByRole('button', { name: `Mark collected for ${part.label}` });
    await expect(collect).toBeVisible({ timeout: 60_000 });
    await tap(collect);
    await expect(assembler.getByText(`${part.label} (${reference}) marked collected.`)).toBeVisible();
  }
  expect(await assembler.evaluate(() => (window as unknown as { boardNotReloaded?: boolean }).boardNotReloaded)).toBe(true);

  // Every part collected: the job is delivered, on the lead's open page without a reload.
  await expect(lead.getByText('Delivered', { exact: true })).toBeVisible();
  await expect(lead.getByText('Every part has been collected')).toBeVisible();
  await lead.screenshot({ path: `${shotsDir}/day-job-delivered-1366.png`, fullPage: true });
});
