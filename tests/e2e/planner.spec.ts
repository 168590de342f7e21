import type { Locator, Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { mainNav, signIn } from './helpers';

/**
 * A Tuesday in July or August (British Summer Time, UTC+1) of a far year picked at random, so a
 * rerun on the same database books free days. The browser sits in New York, so a time that shows
 * right can only come from the shop's zone (Europe/London), not the device's.
 */
function summerTuesday(): { tuesday: string; wednesday: string; thursday: string; saturday: string } {
  const year = new Date().getFullYear() + 2 + Math.floor(Math.random() * 500);
  const firstOfJuly = new Date(Date.UTC(year, 6, 1));
  const week = Math.floor(Math.random() * 8);
  const tuesday = new Date(Date.UTC(year, 6, 1 + ((2 - firstOfJuly.getUTCDay() + 7) % 7) + week * 7));
  const day = (n: number) => new Date(tuesday.getTime() + n * 86_400_000).toISOString().slice(0, 10);
  return { tuesday: day(0), wednesday: day(1), thursday: day(2), saturday: day(4) };
}

const { tuesday, wednesday, thursday, saturday } = summerTuesday();
const booth = 'Booth 1 (cross-draft)';
const sprayRoom = 'Back spray room';

test.use({ timezoneId: 'America/New_York' });
test.describe.configure({ mode: 'serial' });

async function openBookingForm(page: Page, start: string, end: string): Promise<Locator> {
  await page.getByRole('button', { name: 'Book a session' }).click();
  const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
  await dialog.getByLabel('Booth').selectOption({ label: booth });
  await dialog.getByLabel('Starts').fill(start);
  await dialog.getByLabel('Ends').fill(end);
  return dialog;
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** One booth's time grid: the planner draws a grid per booth. */
function boothCalendar(page: Page, name = booth): Locator {
  return page.getByRole('region', { name: new RegExp(`^Calendar, .*, ${escapeRegExp(name)}$`) });
}

function calendarEvent(page: Page, text: string, name = booth): Locator {
  return boothCalendar(page, name).locator('.fc-timegrid-event', { hasText: text });
}

test.describe('booth planner', () => {
  test('a lead books a session from the form and sees it at 09:00 shop time, whatever the device’s zone', async ({ page }) => {
    await signIn(page, 'lead', '/');
    await mainNav(page).getByRole('link', { name: 'Booth planner' }).click();
    await expect(page.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();

    const dialog = await openBookingForm(page, `${tuesday}T09:00`, `${tuesday}T10:00`);
    await dialog.getByLabel('Job').selectOption({ label: 'LJ-26-105 · Ardent Bathrooms' });
    await expect(dialog.getByLabel('Coat')).toHaveValue('0');
    await dialog.getByRole('button', { name: 'Choose all 8 parts' }).click();
    await expect(dialog.getByText('8 parts chosen')).toBeVisible();
    // 15 min set-up and 20 min clean-down (the shop's defaults) around the spraying itself.
    await expect(dialog.getByText(/Suggested length \d+ min: [\d.]+ m² at 24 m²\/h in Booth 1 \(cross-draft\), plus 15 min set-up and 20 min clean-down/)).toBeVisible();
    const useEnd = dialog.getByRole('button', { name: /^End at \d\d:\d\d$/ });
    const suggestedEnd = (await useEnd.textContent())!.replace('End at ', '');
    await useEnd.click();
    await expect(dialog.getByLabel('Ends')).toHaveValue(`${tuesday}T${suggestedEnd}`);
    await dialog.getByLabel('Notes').fill('Primer coat on the vanity doors.');
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog).toBeHidden();

    // The calendar jumps to the booked week; the session says what it sprays, its state and sprayer in words.
    const event = calendarEvent(page, 'LJ-26-105');
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('LJ-26-105 · coat 1 of 3');
    await expect(event).toContainText('Kestrel 2K PU Primer White · Ink blue');
    await expect(event).toContainText('8 parts');
    await expect(event).toContainText('No sprayer yet');
    await expect(event).toContainText(booth);
    await expect(event).toContainText(`09:00 - ${suggestedEnd}`);
    // It sits on the 09:00 row of its booth's grid, and the server holds 08:00 UTC.
    const slot = await boothCalendar(page).locator('.fc-timegrid-slot-lane[data-time="09:00:00"]').boundingBox();
    const block = await event.boundingBox();
    expect(Math.abs(block!.y - slot!.y)).toBeLessThan(3);
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string; boothName: string }[] };
    expect(items.find((s) => s.boothName === booth)?.start).toBe(`${tuesday}T08:00:00.000Z`);
    await expect(page.getByRole('button', { name: /09:00–\d\d:\d\d BST.*Booth 1 \(cross-draft\).*Planned.*LJ-26-105 · coat 1 of 3: Kestrel 2K PU Primer White · Ink blue · 8 parts/ })).toBeVisible();
    await page.screenshot({ path: '/tmp/shots/planner-week-1280.png', fullPage: true });
  });

  test('an overlapping booking is refused with the reason in words', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${tuesday}T09:30`, `${tuesday}T10:30`);
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog.getByRole('alert')).toContainText(/Booth 1 \(cross-draft\) is already booked .*09:00–.*\d\d:\d\d \(spray session \d+\)/);
    await expect(dialog.getByRole('button', { name: 'Book anyway' })).toHaveCount(0);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await expect(dialog).toBeHidden();
  });

  test('a Saturday booking goes ahead only with a reason, and the summary shows it with the cautions', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${saturday}T10:00`, `${saturday}T11:00`);
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog.getByRole('alert')).toContainText('The booth is closed on Saturdays. A lead may book it anyway with a reason.');
    await dialog.getByRole('button', { name: 'Book anyway' }).click();
    await expect(dialog.getByText('Say why this booking goes ahead anyway')).toBeVisible();
    await expect(dialog).toBeVisible();
    await dialog.getByLabel('Reason for booking anyway').fill('Rush order for Ardent Bathrooms; overtime agreed');
    await dialog.getByRole('button', { name: 'Book anyway' }).click();
    await expect(dialog).toBeHidden();

    const event = calendarEvent(page, '10:00 - 11:00');
    await expect(event).toContainText('Planned');
    await event.click();
    const summary = page.getByRole('dialog', { name: /^Spray session \d+$/ });
    await expect(summary).toContainText(/Booked outside opening hours because:\s*Rush order for Ardent Bathrooms; overtime agreed/);
    await expect(summary.getByRole('heading', { name: 'Safety cautions' })).toBeVisible();
    await expect(summary).toContainText('Not worked out: no products are known for this session yet.');
    await expect(summary).toContainText('These are reminders, not a risk assessment.');
    await expect(summary.getByRole('link', { name: 'Open the spray session' })).toHaveAttribute('href', /^\/spray-sessions\/\d+$/);
    await page.setViewportSize({ width: 1024, height: 768 });
    await page.screenshot({ path: '/tmp/shots/planner-summary-1024.png' });
  });

  test('a sprayer sees the plan read-only, with the cautions the booked coat calls for', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, 'sprayer', '/planner');
    await expect(page.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();
    await page.getByLabel('Go to day').fill(tuesday);
    const event = calendarEvent(page, '09:00 - ');
    await expect(event).toContainText('Planned');
    await expect(page.getByRole('button', { name: /Book/ })).toHaveCount(0);
    await expect(event).not.toHaveClass(/fc-event-draggable/);
    await page.screenshot({ path: '/tmp/shots/planner-sprayer-1024.png', fullPage: true });

    await event.click();
    const summary = page.getByRole('dialog', { name: /^Spray session \d+$/ });
    await expect(summary).toContainText('Planned parts (8)');
    await expect(summary).toContainText('Kestrel 2K PU Primer White');
    // The primer is an isocyanate: the strictest protection, and the SDS has the last word.
    await expect(summary).toContainText('Air-fed respiratory protection');
    await expect(summary).toContainText('These are reminders, not a risk assessment.');
    await expect(summary.getByRole('button', { name: 'Cancel session' })).toHaveCount(0);
    await expect(summary.getByRole('button', { name: 'Change booking' })).toHaveCount(0);
  });
});

/** Presses on a booth's free time at `from` (HH:MM) on `date` and drags down to `to`, as a lead books by hand. */
async function dragAcrossFreeTime(page: Page, calendar: Locator, date: string, from: string, to: string) {
  const start = calendar.locator(`.fc-timegrid-slot-lane[data-time="${from}:00"]`);
  await start.scrollIntoViewIfNeeded();
  const column = (await calendar.locator(`.fc-timegrid-col[data-date="${date}"]`).boundingBox())!;
  const top = (await start.boundingBox())!;
  const bottom = (await calendar.locator(`.fc-timegrid-slot-lane[data-time="${to}:00"]`).boundingBox())!;
  await drag(page, { x: column.x + column.width / 2, y: top.y + 4 }, { x: column.x + column.width / 2, y: bottom.y - 4 });
}

async function bookThroughForm(page: Page, expected: { booth: string; start: string; end: string }, job: { label: string; parts: number }, sprayer?: string) {
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

test.describe('booking by dragging across free time', () => {
  test('at 1366 px in the week view: the form opens on that booth and time, offers the site’s sprayers, and the block says what it sprays', async ({ page }) => {
    await page.setViewportSize({ width: 1366, height: 900 });
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(wednesday);
    await dragAcrossFreeTime(page, boothCalendar(page), wednesday, '09:00', '10:30');
    const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
    // The lead chooses among the site's active sprayers and leads, not only themself.
    const choices = dialog.getByLabel('Sprayer').locator('option');
    await expect(choices).toHaveText(['Not assigned yet', 'Dev Okafor (me)', 'Mina Castell']);
    await bookThroughForm(page, { booth, start: `${wednesday}T09:00`, end: `${wednesday}T10:30` }, { label: 'LJ-26-101 · Hartfield Kitchen Co.', parts: 42 }, 'Mina Castell');
    const block = calendarEvent(page, 'LJ-26-101').filter({ hasText: /^09:00 - 10:30/ });
    await expect(block).toContainText('LJ-26-101 · coat 1 of 3');
    await expect(block).toContainText('Kestrel 2K PU Primer White · Sage grey (customer sample 14)');
    await expect(block).toContainText('42 parts');
    await expect(block).toContainText('Mina Castell');

    // The spray room at the same hour: each booth keeps its own lane, so neither block is squeezed to half a day.
    await dragAcrossFreeTime(page, boothCalendar(page, sprayRoom), wednesday, '09:00', '10:30');
    await bookThroughForm(page, { booth: sprayRoom, start: `${wednesday}T09:00`, end: `${wednesday}T10:30` }, { label: 'LJ-26-104 · St Brannock School', parts: 18 });
    const roomBlock = calendarEvent(page, 'LJ-26-104', sprayRoom);
    await expect(roomBlock).toContainText(sprayRoom);
    for (const [calendar, shown] of [[boothCalendar(page), block], [boothCalendar(page, sprayRoom), roomBlock]] as const) {
      const column = (await calendar.locator(`.fc-timegrid-col[data-date="${wednesday}"]`).boundingBox())!;
      expect((await shown.boundingBox())!.width).toBeGreaterThan(column.width * 0.85);
    }
    await page.screenshot({ path: '/tmp/shots/planner-drag-booked-1366.png', fullPage: true });
  });

  test('at 1024 px in the day view: dragging in a booth’s column books that booth', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, 'lead', '/planner');
    await page.getByRole('button', { name: 'Day', exact: true }).click();
    await page.getByLabel('Go to day').fill(thursday);
    await dragAcrossFreeTime(page, boothCalendar(page, sprayRoom), thursday, '11:00', '12:00');
    await bookThroughForm(page, { booth: sprayRoom, start: `${thursday}T11:00`, end: `${thursday}T12:00` }, { label: 'LJ-26-103 · Penhallow Interiors', parts: 18 });
    await expect(calendarEvent(page, 'LJ-26-103', sprayRoom)).toContainText('11:00 - 12:00');
    await page.screenshot({ path: '/tmp/shots/planner-day-1024.png', fullPage: true });
  });

  test('on a 390 px phone the planner falls back to the day view, and dragging still books', async ({ page }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signIn(page, 'lead', '/planner');
    await expect(page.getByText('Day view on a narrow screen')).toBeVisible();
    await page.getByLabel('Go to day').fill(thursday);
    await dragAcrossFreeTime(page, boothCalendar(page), thursday, '08:00', '09:00');
    await bookThroughForm(page, { booth, start: `${thursday}T08:00`, end: `${thursday}T09:00` }, { label: 'LJ-26-102 · Morrow & Daughters Cabinetmakers', parts: 80 });
    await expect(calendarEvent(page, 'LJ-26-102')).toContainText('08:00 - 09:00');
    await page.screenshot({ path: '/tmp/shots/planner-phone-390.png', fullPage: true });
  });
});

test.describe('booth planner, dragging', () => {
  test.use({ viewport: { width: 1280, height: 1000 } });

  test('a lead drags a session to a later time; a drag onto a closed day goes back with the reason', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(tuesday);
    const calendar = boothCalendar(page);
    await calendar.scrollIntoViewIfNeeded();
    const event = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^09:00 - / });
    const from = (await event.boundingBox())!;
    const elevenOClock = (await calendar.locator('.fc-timegrid-slot-lane[data-time="11:00:00"]').boundingBox())!;
    await drag(page, { x: from.x + from.width / 2, y: from.y + 6 }, { x: from.x + from.width / 2, y: elevenOClock.y + 6 });

    const moved = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00 - / });
    await expect(moved).toBeVisible();
    await expect(page.getByText(/Moved: Booth 1 \(cross-draft\), .*11:00–/)).toBeVisible();
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string }[] };
    expect(items.map((s) => s.start)).toContain(`${tuesday}T10:00:00.000Z`);

    // Sideways onto Saturday at the same time (after the 10:00–11:00 booking there): the booth is
    // closed, so the server refuses, the block goes back and the lead is asked for a reason.
    const block = (await moved.boundingBox())!;
    const saturdayColumn = (await calendar.locator('.fc-col-header-cell.fc-day-sat').boundingBox())!;
    await drag(page, { x: block.x + block.width / 2, y: block.y + 6 }, { x: saturdayColumn.x + saturdayColumn.width / 2, y: block.y + 6 });
    const ask = page.getByRole('dialog', { name: 'Outside opening hours' });
    await expect(ask).toContainText('The booth is closed on Saturdays. A lead may book it anyway with a reason.');
    await page.screenshot({ path: '/tmp/shots/planner-drag-refused-1280.png' });
    await ask.getByRole('button', { name: 'Leave it where it was' }).click();
    await expect(ask).toBeHidden();
    await expect(moved).toBeVisible();
    await expect(calendar.locator('.fc-day-sat .fc-timegrid-event', { hasText: /^11:00 - / })).toHaveCount(0);
  });

  test('while the next coat is dragged its recoat window shows on the calendar, and the move can be undone', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${tuesday}T15:00`, `${tuesday}T16:00`);
    await dialog.getByLabel('Job').selectOption({ label: 'LJ-26-105 · Ardent Bathrooms' });
    await dialog.getByLabel('Coat').selectOption('2');
    await dialog.getByRole('button', { name: 'Choose all 8 parts' }).click();
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog).toBeHidden();
    const calendar = boothCalendar(page);
    const topcoat = calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^15:00 - 16:00/ });
    await expect(topcoat).toContainText('Kestrel 2K PU Topcoat Satin · Ink blue');

    // The primer before it is booked, not sprayed: its window is worked out from that booking's end.
    await topcoat.scrollIntoViewIfNeeded();
    const from = (await topcoat.boundingBox())!;
    const fourOClock = (await calendar.locator('.fc-timegrid-slot-lane[data-time="16:00:00"]').boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + 6);
    await page.mouse.down();
    await page.mouse.move(from.x + from.width / 2 + 4, from.y + 10, { steps: 4 });
    await page.mouse.move(from.x + from.width / 2, fourOClock.y + 6, { steps: 12 });
    await expect(calendar.locator('.bw-recoat-open').first()).toBeVisible();
    await expect(calendar.locator('.bw-recoat-too-soon').first()).toBeAttached();
    await expect(calendar.getByText(/Recoat window from .*\d\d:\d\d, no closing time \(from the booked coat before\)/)).toBeVisible();
    await page.screenshot({ path: '/tmp/shots/planner-recoat-window-1280.png' });
    await page.mouse.up();
    await expect(calendar.locator('.bw-recoat')).toHaveCount(0);

    const toast = page.locator('[data-sonner-toast]', { hasText: /Moved: Booth 1 \(cross-draft\), .*16:00–17:00/ });
    await expect(toast).toBeVisible();
    await expect(calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^16:00 - 17:00/ })).toBeVisible();
    await toast.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByText(/Put back: Booth 1 \(cross-draft\), .*15:00–16:00/)).toBeVisible();
    await expect(calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^15:00 - 16:00/ })).toBeVisible();
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string; work: { coats: { coatNumber: number }[] } }[] };
    expect(items.find((s) => s.work.coats[0]?.coatNumber === 2)?.start).toBe(`${tuesday}T14:00:00.000Z`);
  });

  test('a lead changes the sprayer from the summary, cancels the session and undoes it', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(tuesday);
    await calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00 - / }).click();
    const summary = page.getByRole('dialog', { name: /^Spray session \d+$/ });
    await summary.getByRole('button', { name: 'Change booking' }).click();
    const form = page.getByRole('dialog', { name: /^Change spray session \d+$/ });
    await expect(form.getByText('Keeps its 8 planned parts unless you choose others.')).toBeVisible();
    await form.getByLabel('Sprayer').selectOption({ label: 'Dev Okafor (me)' });
    await form.getByRole('button', { name: 'Save changes' }).click();
    await expect(form).toBeHidden();
    const event = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00 - / });
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('Dev Okafor');

    // …and gives it to the sprayer instead.
    await event.click();
    await summary.getByRole('button', { name: 'Change booking' }).click();
    await form.getByLabel('Sprayer').selectOption({ label: 'Mina Castell' });
    await form.getByRole('button', { name: 'Save changes' }).click();
    await expect(form).toBeHidden();
    await expect(event).toContainText('Mina Castell');

    await event.click();
    await summary.getByRole('button', { name: 'Cancel session' }).click();
    await expect(summary).toBeHidden();
    const toast = page.locator('[data-sonner-toast]', { hasText: 'Cancelled: Booth 1 (cross-draft)' });
    await expect(toast).toBeVisible();
    await expect(event).toHaveCount(0);
    await page.getByLabel('Show cancelled sessions').check();
    await expect(event).toContainText('Cancelled');
    await expect(event.locator('.line-through', { hasText: 'Mina Castell' })).toBeVisible();
    await toast.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByText(/Back in the plan: Booth 1/)).toBeVisible();
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('Mina Castell');
  });
});

async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  // A few small steps first: the calendar only starts a drag once the pointer has moved.
  await page.mouse.move(from.x + 4, from.y + 4, { steps: 4 });
  await page.mouse.move(to.x, to.y, { steps: 12 });
  await page.mouse.up();
}
