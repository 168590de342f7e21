import type { Locator, Page } from '@playwright/test';
import { expect } from './fixtures';

/**
 * A Tuesday in July or August (British Summer Time, UTC+1) of a far year picked at random, so a
 * rerun on the same database books free days.
 */
export function summerWeek(): { tuesday: string; wednesday: string; thursday: string; saturday: string } {
  // Far enough ahead to be free of other tests' bookings, inside the years the API accepts (to 2199).
  const year = new Date().getFullYear() + 2 + Math.floor(Math.random() * 150);
  const firstOfJuly = new Date(Date.UTC(year, 6, 1));
  const week = Math.floor(Math.random() * 8);
  const tuesday = new Date(Date.UTC(year, 6, 1 + ((2 - firstOfJuly.getUTCDay() + 7) % 7) + week * 7));
  const day = (n: number) => new Date(tuesday.getTime() + n * 86_400_000).toISOString().slice(0, 10);
  return { tuesday: day(0), wednesday: day(1), thursday: day(2), saturday: day(4) };
}

export const booth = 'Booth 1 (cross-draft)';
export const sprayRoom = 'Back spray room';

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** One booth's time grid: the planner draws a grid per booth. */
export function boothCalendar(page: Page, name = booth): Locator {
  return page.getByRole('region', { name: new RegExp(`^Calendar, .*, ${escapeRegExp(name)}$`) });
}

export function calendarEvent(page: Page, text: string, name = booth): Locator {
  return boothCalendar(page, name).locator('.fc-timegrid-event', { hasText: text });
}

export async function openBookingForm(page: Page, start: string, end: string): Promise<Locator> {
  await page.getByRole('button', { name: 'Book a session' }).click();
  const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
  await dialog.getByLabel('Booth').selectOption({ label: booth });
  await dialog.getByLabel('Starts').fill(start);
  await dialog.getByLabel('Ends').fill(end);
  return dialog;
}

/** Presses on a booth's free time at `from` (HH:MM) on `date` and drags down to `to`, as a lead books by hand. */
export async function dragAcrossFreeTime(page: Page, calendar: Locator, date: string, from: string, to: string) {
  const start = calendar.locator(`.fc-timegrid-slot-lane[data-time="${from}:00"]`);
  await start.scrollIntoViewIfNeeded();
  const column = (await calendar.locator(`.fc-timegrid-col[data-date="${date}"]`).boundingBox())!;
  const top = (await start.boundingBox())!;
  const bottom = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${to}:00"]`).boundingBox())!;
  await drag(page, { x: column.x + column.width / 2, y: top.y + 4 }, { x: column.x + column.width / 2, y: bottom.y - 4 });
}

export async function bookThroughForm(page: Page, expected: { booth: string; start: string; end: string }, job: { label: string; parts: number }, sprayer?: string) {
  const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
  await expect(dialog.getByLabel('Booth')).toHaveValue(await boothId(page, expected.booth));
  await expect(dialog.getByLabel('Starts')).toHaveValue(expected.start);
  await expect(dialog.getByLabel('Ends')).toHaveValue(expected.end);
  await dialog.getByLabel('Job').selectOption({ label: job.label });
  await dialog.getByRole('button', { name: `Choose all ${job.parts} parts` }).click();
  if (sprayer) await dialog.getByLabel('Sprayer').selectOption({ label: sprayer });
  await dialog.getByRole('button', { name: 'Book session' }).click();
  await expect(dialog).toBeHidden();
}

async function boothId(page: Page, name: string): Promise<string> {
  const { items } = (await (await page.request.get('/api/booths')).json()) as { items: { id: number; name: string }[] };
  return String(items.find((b) => b.name === name)!.id);
}

export async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  // A few small steps first: the calendar only starts a drag once the pointer has moved.
  await page.mouse.move(from.x + 4, from.y + 4, { steps: 4 });
  await page.mouse.move(to.x, to.y, { steps: 12 });
  await page.mouse.up();
}
