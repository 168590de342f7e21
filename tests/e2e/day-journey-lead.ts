import type { Locator, Page } from '@playwright/test';
import { expect } from './fixtures';
import { mainNav } from './helpers';
import { boothCalendar, drag } from './planner-helpers';

/** A drying table in minutes, as typed off a data sheet, at one temperature. */
export interface DryingRow {
  flashOff: number;
  recoatFrom: number;
  recoatUntil: number | null;
  touchDry: number;
  handle: number;
  pack: number;
  fullCureH: number;
}

export interface DataSheet {
  name: string;
  kind: 'Primer' | 'Topcoat';
  dryFilmUm: number;
  drying: DryingRow;
}

/** The lead types a data sheet in through the form, as from the maker's sheet. */
export async function addDataSheet(page: Page, sheet: DataSheet) {
  await mainNav(page).getByRole('link', { name: 'Data sheets' }).click();
  await page.getByRole('link', { name: 'Add data sheet' }).click();
  const form = page.getByRole('form', { name: 'New data sheet' });
  await form.getByLabel('Product name').fill(sheet.name);
  await form.getByLabel('Kind').selectOption({ label: sheet.kind });
  await form.getByLabel('Chemistry').selectOption({ label: 'Water-borne' });
  await form.getByLabel('Volume solids').fill('40');
  await form.getByLabel('Dry film per coat').fill(String(sheet.dryFilmUm));
  const cells: [string, number | null][] = [
    ['Temperature (°C)', 20],
    // Times in minutes: a new row's boxes start in minutes (each has its own minutes/hours choice).
    ['Flash-off', sheet.drying.flashOff],
    ['Recoat from', sheet.drying.recoatFrom],
    ['Recoat until', sheet.drying.recoatUntil],
    ['Touch dry', sheet.drying.touchDry],
    ['Handle', sheet.drying.handle],
    ['Pack', sheet.drying.pack],
    ['Full cure (h)', sheet.drying.fullCureH],
  ];
  for (const [label, value] of cells) await form.getByLabel(`${label}, row 1`, { exact: true }).fill(value === null ? '' : String(value));
  await form.getByRole('button', { name: 'Save data sheet' }).click();
  await expect(page.getByRole('heading', { name: sheet.name, level: 1 })).toBeVisible();
}

/** Primer, denib, topcoat: the lead builds the system from the two new data sheets. */
export async function addFinishSystem(page: Page, name: string, primer: string, topcoat: string) {
  await mainNav(page).getByRole('link', { name: 'Finish systems' }).click();
  await page.getByRole('button', { name: 'Add finish system' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a finish system' });
  await dialog.getByLabel('Name', { exact: true }).fill(name);
  await dialog.getByRole('button', { name: 'Add coat' }).click();
  await dialog.getByLabel('Product, step 1').selectOption({ label: primer });
  await dialog.getByRole('button', { name: 'Add denib step' }).click();
  await expect(dialog.getByLabel('Grit, step 2')).toHaveValue('P320');
  await dialog.getByRole('button', { name: 'Add coat' }).click();
  await dialog.getByLabel('Product, step 3').selectOption({ label: topcoat });
  await dialog.getByRole('button', { name: 'Save finish system' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole('heading', { name })).toBeVisible();
}

export interface NewPart {
  label: string;
  lengthMm: number;
  widthMm: number;
  shelf: number;
}

/** A new job on the system, and its parts through the part form, each put on a drying rack. */
export async function addJob(page: Page, job: { reference: string; customer: string; dueDate: string; system: string; colour: string }, parts: NewPart[]) {
  await mainNav(page).getByRole('link', { name: 'Jobs', exact: true }).click();
  await page.getByRole('button', { name: 'Add job' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a job' });
  await dialog.getByLabel('Job reference').fill(job.reference);
  await dialog.getByLabel('Customer').fill(job.customer);
  await dialog.getByLabel('Due date').fill(job.dueDate);
  await dialog.getByLabel('Finish system').selectOption({ label: `${job.system} (2 coats)` });
  await dialog.getByLabel('Colour').fill(job.colour);
  await dialog.getByRole('button', { name: 'Save job' }).click();
  await expect(page.getByRole('heading', { name: `Job ${job.reference}`, level: 1 })).toBeVisible();
  for (const part of parts) {
    await page.getByRole('button', { name: 'Add part' }).click();
    const partDialog = page.getByRole('dialog', { name: 'Add a part' });
    await partDialog.getByLabel('Label').fill(part.label);
    await partDialog.getByLabel('Length').fill(String(part.lengthMm));
    await partDialog.getByLabel('Width').fill(String(part.widthMm));
    await partDialog.getByLabel('Thickness').fill('18');
    await partDialog.getByLabel('Rack').selectOption({ label: 'Rack B (drying room) (20 shelves)' });
    await partDialog.getByLabel('Shelf').selectOption({ label: `Shelf ${part.shelf}` });
    await partDialog.getByRole('button', { name: 'Save part' }).click();
    await expect(partDialog).toBeHidden();
    await expect(page.getByRole('row', { name: new RegExp(part.label) })).toBeVisible();
  }
}

/** The shop's date and the current quarter hour on its clock, and the quarter hours after it. */
function shopQuarterHours(timeZone: string, count: number): { date: string; slots: string[] } {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).formatToParts(new Date());
  const part = (type: string) => parts.find((p) => p.type === type)!.value;
  const first = Number(part('hour')) * 4 + Math.floor(Number(part('minute')) / 15);
  // Near midnight the booking stays on today's column: the last quarter hours of the day.
  const start = Math.min(first, 96 - count);
  const slots = Array.from({ length: count }, (_, i) => {
    const q = start + i;
    return `${String(Math.floor(q / 4)).padStart(2, '0')}:${String((q % 4) * 15).padStart(2, '0')}`;
  });
  return { date: `${part('year')}-${part('month')}-${part('day')}`, slots };
}

/** Whether a booth's lane has no block in the column of `date` from the first slot to the end of the last. */
async function isFree(calendar: Locator, date: string, slots: string[]): Promise<boolean> {
  const top = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots[0]}:00"]`).boundingBox())!.y;
  const last = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots.at(-1)}:00"]`).boundingBox())!;
  const bottom = last.y + last.height;
  for (const block of await calendar.locator(`.fc-timegrid-col[data-date="${date}"] .fc-timegrid-event`).all()) {
    const box = (await block.boundingBox())!;
    if (box.y < bottom - 1 && box.y + box.height > top + 1) return false;
  }
  return true;
}

/** Drags down a booth's lane from the first slot to the end of the last, in the column of `date`. */
async function dragAcross(page: Page, calendar: Locator, date: string, slots: string[]) {
  const column = (await calendar.locator(`.fc-timegrid-col[data-date="${date}"]`).boundingBox())!;
  const top = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots[0]}:00"]`).boundingBox())!;
  const bottom = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots.at(-1)}:00"]`).boundingBox())!;
  const x = column.x + column.width / 2;
  await drag(page, { x, y: top.y + 4 }, { x, y: bottom.y + bottom.height - 4 });
}

/**
 * The lead finds a booth whose lane is free from now for the next hour in the week view, drags
 * across it, and books the job's first coat on all its parts there. Outside opening hours (an
 * early start, a weekend) the form asks for a reason, and the lead gives one.
 */
export async function bookByDraggingNow(page: Page, timeZone: string, booths: string[], job: { reference: string; customer: string }): Promise<string> {
  const { date, slots } = shopQuarterHours(timeZone, 4);
  for (const booth of booths) {
    const calendar = boothCalendar(page, booth);
    // Both ends of the hour in view of the lane's own scroller, whatever the time of day.
    await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots.at(-1)}:00"]`).scrollIntoViewIfNeeded();
    await calendar.locator(`.fc-timegrid-slot-lane[data-time="${slots[0]}:00"]`).scrollIntoViewIfNeeded();
    if (!(await isFree(calendar, date, slots))) continue;
    await dragAcross(page, calendar, date, slots);
    const booking = page.getByRole('dialog', { name: 'Book a spray session' });
    await expect(booking.getByLabel('Booth').locator('option:checked')).toHaveText(booth);
    await booking.getByLabel('Job').selectOption({ label: `${job.reference} · ${job.customer}` });
    await expect(booking.getByLabel('Coat').locator('option:checked')).toHaveText(/^Coat 1 of 2/);
    await booking.getByRole('button', { name: /^Choose all \d+ parts$/ }).click();
    await booking.getByRole('button', { name: 'Book session' }).click();
    const reason = booking.getByLabel('Reason for booking anyway');
    await expect(reason.or(page.getByText(/^Booked: /))).toBeVisible();
    if (await reason.isVisible()) {
      await reason.fill('Rush job: primer and topcoat today');
      await booking.getByRole('button', { name: 'Book anyway' }).click();
    }
    await expect(booking).toBeHidden();
    await expect(calendar.locator('.fc-timegrid-event', { hasText: `${job.reference} · coat 1 of 2` })).toBeVisible();
    return booth;
  }
  throw new Error(`No booth is free from ${slots[0]} on ${date}`);
}
